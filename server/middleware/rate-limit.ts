import { rateLimit } from 'express-rate-limit';

import { HttpError } from '../errors';

/** A per-address limit for the open routes (the model, cable sizing, log analysis, unsubscribe links), answered as problem JSON. Make one and share it: each instance counts on its own. */
export function rateLimitedOpen(perMinute: number) {
  return rateLimit({
    windowMs: 60_000,
    limit: perMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new HttpError(429, 'rate_limited', 'Too many requests from this address; try again in a minute.')),
  });
}
