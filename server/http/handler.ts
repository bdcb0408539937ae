import type { Request, RequestHandler, Response } from 'express';
import type { z } from 'zod';

import { HttpError, issuesToFields } from '../errors';

/**
 * The zod schema of each part of a request the handler reads. Parts are parsed in this order and the
 * first that fails answers 400 naming its fields. (A `response` schema will sit beside these.)
 */
export type RequestSchemas = { params?: z.ZodType; query?: z.ZodType; body?: z.ZodType };

type Parsed<S extends RequestSchemas, K extends keyof RequestSchemas> = S[K] extends z.ZodType ? z.infer<S[K]> : undefined;

export type HandlerInput<S extends RequestSchemas> = {
  params: Parsed<S, 'params'>;
  query: Parsed<S, 'query'>;
  body: Parsed<S, 'body'>;
  req: Request;
  res: Response;
};

const PARTS = ['params', 'query', 'body'] as const;

/**
 * A route's last step: parses params, query and body with their schemas and calls `fn` with the typed
 * values. A part that fails is a 400 `validation_failed` whose fields name the paths; `fn` is not called.
 */
export function handler<S extends RequestSchemas>(schemas: S, fn: (input: HandlerInput<S>) => unknown): RequestHandler {
  return async (req, res) => {
    const values: Record<(typeof PARTS)[number], unknown> = { params: undefined, query: undefined, body: undefined };
    for (const part of PARTS) {
      const schema = schemas[part];
      if (!schema) continue;
      const result = schema.safeParse(req[part]);
      if (!result.success) throw new HttpError(400, 'validation_failed', 'Some fields are not valid.', issuesToFields(result.error));
      values[part] = result.data;
    }
    await fn({ ...(values as Pick<HandlerInput<S>, 'params' | 'query' | 'body'>), req, res });
  };
}
