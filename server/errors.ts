import type { z } from 'zod';

/** The closed set of error codes the API answers with. */
export type ErrorCode =
  | 'bad_request'
  | 'validation_failed'
  | 'unauthenticated'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'payload_too_large'
  | 'rate_limited'
  | 'no_conductor'
  | 'expired'
  | 'unsupported_media_type'
  | 'unprocessable'
  | 'storage_unavailable'
  | 'unavailable'
  | 'internal';

export type FieldError = { path: string; message: string };

export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields: FieldError[] = [],
    /** Sent as Retry-After (seconds) with a 429 or 503. */
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

/** A zod error as the API's field list: each issue's path (an unknown key names itself) and message. */
export function issuesToFields(error: z.ZodError): FieldError[] {
  return error.issues.map((i) => ({ path: [...i.path, ...(i.code === 'unrecognized_keys' ? [i.keys.join(', ')] : [])].join('.') || '(body)', message: i.message }));
}
