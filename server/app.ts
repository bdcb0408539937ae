import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { Logger } from 'pino';

import type { Db } from '@/db/client';
import type { Config } from './config';
import { errorHandler, notFoundApi } from './middleware/error-handler';
import { rateLimitedOpen } from './middleware/rate-limit';
import { cableRunsRouter } from './routes/cable-runs';
import { healthRouter } from './routes/health';
import { projectionsRouter } from './routes/projections';
import { serveWeb } from './web';

export type AppDeps = { config: Config; db: Db; logger: Logger };

export const APP_VERSION = '0.1.0';

/** Builds the whole HTTP app; index.ts only listens. Tests drive this over HTTP with supertest. */
export function createApp({ config, db, logger }: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Expo's static pages carry small inline scripts; Skia's charts need WebAssembly.
          'script-src': ["'self'", "'unsafe-inline'", "'wasm-unsafe-eval'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'"],
          'upgrade-insecure-requests': null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  // (The auth handler mounts here, before the JSON parser.)
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api/health', healthRouter(db, APP_VERSION));
  app.use('/api/projections', rateLimitedOpen(config.RATE_LIMIT_PER_MINUTE), projectionsRouter());
  app.use('/api/cable-runs', rateLimitedOpen(config.RATE_LIMIT_PER_MINUTE), cableRunsRouter());
  app.use('/api', notFoundApi);

  const serve = config.SERVE_WEB ?? config.NODE_ENV === 'production';
  if (serve) serveWeb(app, config.WEB_DIST);

  app.use(errorHandler);
  return app;
}
