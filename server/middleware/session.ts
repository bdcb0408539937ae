import type { NextFunction, Request, Response } from 'express';
import { fromNodeHeaders } from 'better-auth/node';

import type { Auth } from '../auth';
import { HttpError } from '../errors';

export type SessionData = NonNullable<Awaited<ReturnType<Auth['api']['getSession']>>>;

/**
 * Reads within a few seconds with the same cookies share one session lookup: a read then costs a map
 * look-up instead of better-auth's signed-cookie check. Only found sessions are kept, never past their
 * expiry, and any write to /api/auth (sign-in, sign-out, password change or reset) or an admin's change of
 * an account role empties the map, so in this process such a change shows on the next read.
 */
const READ_CACHE_MS = 5_000;
const READ_CACHE_SIZE = 10_000;
type ReadCache = Map<string, { data: SessionData; until: number }>;
// One map per auth instance (per secret): a cookie one app accepted never opens another in the same process.
const readCaches = new Map<Auth, ReadCache>();

export function forgetCachedSessions() {
  for (const cache of readCaches.values()) cache.clear();
}

/**
 * Reads the better-auth session; 401 without one. Handlers read it with `session(res)`. Every look-up
 * checks the session in the database (never the signed cookie cache, which a copied cookie could replay
 * after sign-out), so a signed-out or revoked session reads nothing once the read cache above lets it go:
 * at once in this process, within READ_CACHE_MS in another.
 */
export function requireSession(auth: Auth) {
  if (!readCaches.has(auth)) readCaches.set(auth, new Map());
  const readCache = readCaches.get(auth)!;
  return async (req: Request, res: Response, next: NextFunction) => {
    const write = req.method !== 'GET' && req.method !== 'HEAD';
    const key = req.headers.cookie;
    if (!write && key) {
      const hit = readCache.get(key);
      if (hit && hit.until > Date.now()) {
        res.locals.session = hit.data;
        return next();
      }
    }
    const data = await auth.api.getSession({ headers: fromNodeHeaders(req.headers), query: { disableCookieCache: true } });
    if (!data) return next(new HttpError(401, 'unauthenticated', 'Sign in to continue.'));
    if (!write && key) {
      if (readCache.size >= READ_CACHE_SIZE) readCache.delete(readCache.keys().next().value!);
      readCache.set(key, { data, until: Math.min(Date.now() + READ_CACHE_MS, new Date(data.session.expiresAt).getTime()) });
    }
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

/** The signed-in person as services record them (history entries, who added a load). */
export const actorOf = (res: Response) => ({ id: session(res).user.id, name: session(res).user.name });
