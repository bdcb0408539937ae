import type { NextFunction, Request, Response } from 'express';
import type { z } from 'zod';

import { HttpError } from '../errors';

export function issuesToFields(error: z.ZodError) {
  return error.issues.map((i) => ({ path: [...i.path, ...(i.code === 'unrecognized_keys' ? [i.keys.join(', ')] : [])].join('.') || '(body)', message: i.message }));
}

type Part = 'body' | 'query' | 'params';

/** Parses one part of the request with a zod schema; handlers read the typed value from res.locals. */
export function validate<S extends z.ZodType>(schema: S, part: Part = 'body') {
  return (req: Request, res: Response, next: NextFunction) => {
    const parsed = schema.safeParse(req[part]);
    if (!parsed.success) {
      return next(new HttpError(400, 'validation_failed', 'Some fields are not valid.', issuesToFields(parsed.error)));
    }
    res.locals[part] = parsed.data;
    next();
  };
}

export function parsed<S extends z.ZodType>(res: Response, _schema: S, part: Part = 'body'): z.infer<S> {
  return res.locals[part] as z.infer<S>;
}
