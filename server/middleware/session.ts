import type { NextFunction, Request, Response } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import type { Auth } from '../auth';
import { HttpError } from '../errors';

export type SessionData = NonNullable<Awaited<ReturnType<Auth['api']['getSession']>>>;

/**
 * Reads the better-auth session; 401 without one. Handlers read it with `session(res)`. Reads may use the
 * signed session cookie cache (up to a minute old); every write checks the session in the database, so a
 * revoked session (password reset or change) can change nothing from that moment.
 */
export function requireSession(auth: Auth) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const write = req.method !== 'GET' && req.method !== 'HEAD';
    const data = await auth.api.getSession({ headers: fromNodeHeaders(req.headers), query: { disableCookieCache: write } });
    if (!data) return next(new HttpError(401, 'unauthenticated', 'Sign in to continue.'));
    res.locals.session = data;
    next();
  };
}

export const session = (res: Response) => res.locals.session as SessionData;

/** Only accounts with the admin role. */
export function requireAdmin(req: Request, res: Response, next: NextFunction) {
  if (session(res).user.role !== 'admin') return next(new HttpError(403, 'forbidden', 'Only an admin can do this.'));
  next();
}
