import { APIError } from 'better-auth/api';

import { type ErrorCode, HttpError } from './errors';

const codes: Record<number, ErrorCode> = { 400: 'bad_request', 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found', 409: 'conflict', 413: 'payload_too_large', 429: 'rate_limited' };

/** Calls a better-auth server API and turns its errors into the API's own problem answers. */
export async function viaAuth<T>(call: () => Promise<T>, field?: string): Promise<T> {
  try {
    return await call();
  } catch (err) {
    if (err instanceof APIError) {
      const status = typeof err.statusCode === 'number' && err.statusCode >= 400 && err.statusCode < 500 ? err.statusCode : 400;
      const message = (err.body as { message?: string } | undefined)?.message ?? err.message ?? 'The request was refused.';
      throw new HttpError(status, codes[status] ?? 'bad_request', message, field ? [{ path: field, message }] : []);
    }
    throw err;
  }
}
