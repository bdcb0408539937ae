import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';

import { HttpError, issuesToFields } from '../errors';

/**
 * A route's contract, from shared/api: the zod schema of each part of the request it reads and of the
 * JSON it answers. Request parts are parsed in this order and the first that fails answers 400 naming its
 * fields. `status` is the answer's status when it is not 200 (201 for a creation, 204 for no body).
 */
export type Contract = {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
  response?: z.ZodType;
  status?: 200 | 201 | 202 | 204;
};

type Parsed<C extends Contract, K extends 'params' | 'query' | 'body'> = C[K] extends z.ZodType ? z.infer<C[K]> : undefined;

export type HandlerInput<C extends Contract> = {
  params: Parsed<C, 'params'>;
  query: Parsed<C, 'query'>;
  body: Parsed<C, 'body'>;
  req: Request;
  res: Response;
};

class Sent {
  readonly #sent = true;
}
/** Returned by a route that wrote its answer itself (a 304, bytes serialised ahead, a redirect). */
export const SENT = new Sent();

/**
 * What the route's function gives back: the body its `response` schema describes (typed from it, so a
 * renamed or missing field does not compile), `SENT`, or nothing for a 204 or a route that sends a page.
 */
export type Reply<C extends Contract> = C['response'] extends z.ZodType ? z.input<C['response']> | Sent : void | Sent;

/** A handler made by `handler`, carrying its contract so a test can hold the OpenAPI registry to it. */
export type ContractHandler = RequestHandler & { contract: Contract };

const PARTS = ['params', 'query', 'body'] as const;

/**
 * A route's last step: parses params, query and body with their schemas, calls `fn` with the typed values
 * and sends what it returns as JSON with the contract's status. A part that fails is a 400
 * `validation_failed` whose fields name the paths; `fn` is not called.
 *
 *     router.post('/loads', handler({ body: loadSchema, response: savedLoadSchema, status: 201 }, ({ body, res }) =>
 *       rigs.addLoad(ctx, rigOf(res), actorOf(res), body)));
 */
export function handler<C extends Contract>(contract: C, fn: (input: HandlerInput<C>) => Reply<C> | Promise<Reply<C>>): ContractHandler {
  const run: RequestHandler = async (req, res) => {
    const values: Record<(typeof PARTS)[number], unknown> = { params: undefined, query: undefined, body: undefined };
    for (const part of PARTS) {
      const schema = contract[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part]);
      if (!result.success) throw new HttpError(400, 'validation_failed', 'Some fields are not valid.', issuesToFields(result.error));
      values[part] = result.data;
    }
    const reply = await fn({ ...(values as Pick<HandlerInput<C>, 'params' | 'query' | 'body'>), req, res });
    if (reply === SENT || res.headersSent) return;
    // Without a status in the contract, the one the route set stays (200 unless it chose, say, a 503).
    if (contract.response) res.status(contract.status ?? res.statusCode).json(reply);
    else if (contract.status === 204) res.status(204).end();
    else throw new Error(`${req.method} ${req.path}: the route sent nothing and its contract has no response`);
  };
  return Object.assign(run, { contract });
}
