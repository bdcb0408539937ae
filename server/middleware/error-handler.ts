import type { ErrorRequestHandler, RequestHandler } from 'express';

import { HttpError } from '../errors';

export const notFoundApi: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'not_found', `No API route ${req.method} ${req.path}.`));
};

/** The one place errors become responses: problem-style JSON; unknown errors leak nothing. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  let problem: HttpError;
  if (err instanceof HttpError) {
    problem = err;
  } else if (err?.type === 'entity.parse.failed') {
    problem = new HttpError(400, 'bad_request', 'The request body is not valid JSON.');
  } else if (err?.type === 'entity.too.large') {
    problem = new HttpError(413, 'payload_too_large', 'The request body is too large.');
  } else if (typeof err?.status === 'number' && err.status >= 400 && err.status < 500) {
    problem = new HttpError(err.status, 'bad_request', 'The request could not be read.');
  } else {
    req.log?.error({ err }, 'unhandled error');
    problem = new HttpError(500, 'internal', 'Something went wrong on our side.');
  }
  res
    .status(problem.status)
    .type('application/problem+json')
    .json({ status: problem.status, code: problem.code, message: problem.message, fields: problem.fields });
};
