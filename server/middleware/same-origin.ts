import type { NextFunction, Request, Response } from 'express';

import { HttpError } from '../errors';

const SAFE = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses a state-changing request that a browser sent from another site (its Origin header names a
 * foreign origin). Session cookies are SameSite=Lax already; this is the second wall. Requests without an
 * Origin (mail programs' one-click unsubscribe, scripts) are not browsers' cross-site requests.
 */
export function sameOrigin(allowed: string[]) {
  const origins = new Set(allowed.map((u) => new URL(u).origin));
  return (req: Request, _res: Response, next: NextFunction) => {
    const origin = req.headers.origin;
    if (SAFE.has(req.method) || !origin || origins.has(origin)) return next();
    next(new HttpError(403, 'forbidden', 'This request came from another site and was refused.', [{ path: 'Origin', message: `${origin} is not Keyoff.` }]));
  };
}
