import type { ErrorRequestHandler, RequestHandler } from 'express';

import { HttpError } from '../errors';

export const notFoundApi: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'not_found', `No API route ${req.method} ${req.path}.`));
};

const DB_DOWN_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', '57P01', '57P02', '57P03', '08000', '08001', '08003', '08004', '08006']);

/** The database (or its connection) is away: a lost connection, a server shutting down or starting up. */
export function isDatabaseDown(err: unknown): boolean {
  for (let e = err as { code?: string; message?: string; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (e.code && DB_DOWN_CODES.has(e.code)) return true;
    if (typeof e.message === 'string' && /Connection terminated|timeout exceeded when trying to connect|the database system is (starting up|shutting down)|Client has encountered a connection error/i.test(e.message)) return true;
  }
  return false;
}

/** The one place errors become responses: problem-style JSON; unknown errors leak nothing. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let problem: HttpError;
  if (err instanceof HttpError) {
    problem = err;
  } else if (err?.type === 'entity.parse.failed') {
    problem = new HttpError(400, 'bad_request', 'The request body is not valid JSON.', [{ path: '(body)', message: 'Send a JSON object.' }]);
  } else if (err?.type === 'entity.too.large') {
    problem = new HttpError(413, 'payload_too_large', 'The request body is too large.', [{ path: '(body)', message: 'At most 1 MB.' }]);
  } else if (isDatabaseDown(err)) {
    req.log?.warn({ err: err?.message }, 'database unavailable');
    problem = new HttpError(503, 'unavailable', 'Keyoff cannot reach its database just now; nothing was changed. Try again in a moment.');
  } else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
    problem = new HttpError(err.status, 'bad_request', 'The request could not be read.', [{ path: '(body)', message: String(err.message ?? 'unreadable').slice(0, 200) }]);
  } else {
    req.log?.error({ err }, 'unhandled error');
    problem = new HttpError(500, 'internal', 'Something went wrong on our side.');
  }
  if (problem.retryAfterSeconds !== undefined) res.set('Retry-After', String(Math.max(1, Math.ceil(problem.retryAfterSeconds))));
  res
    .status(problem.status)
    .type('application/problem+json')
    .json({ status: problem.status, code: problem.code, message: problem.message, fields: problem.fields, ...(problem.retryAfterSeconds !== undefined ? { retryAfterSeconds: Math.max(1, Math.ceil(problem.retryAfterSeconds)) } : {}) });
};
