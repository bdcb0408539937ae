import type { NextFunction, Request, Response } from 'express';

/**
 * Only for `npm run dev`, where the Expo dev server (another port) calls the API: the origins in
 * TRUSTED_ORIGINS may call it with their cookies. In production the app and the API share one origin.
 */
export function devCors(origins: string[]) {
  return (req: Request, res: Response, next: NextFunction) => {
    const origin = req.headers.origin;
    if (origin && origins.includes(origin)) {
      res.setHeader('Access-Control-Allow-Origin', origin);
      res.setHeader('Access-Control-Allow-Credentials', 'true');
      res.setHeader('Access-Control-Allow-Headers', 'Content-Type, Accept');
      res.setHeader('Access-Control-Allow-Methods', 'GET, POST, PATCH, PUT, DELETE, OPTIONS');
      res.setHeader('Vary', 'Origin');
      if (req.method === 'OPTIONS') return res.status(204).end();
    }
    next();
  };
}
