import compression from 'compression';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { toNodeHandler } from 'better-auth/node';

import { CLIENT_IP_HEADER } from './auth';
import { authGate } from './middleware/auth-gate';
import type { AppContext } from './context';
import { devCors } from './middleware/cors';
import { errorHandler, notFoundApi } from './middleware/error-handler';
import { rateLimitedOpen } from './middleware/rate-limit';
import { sameOrigin } from './middleware/same-origin';
import { forgetCachedSessions, requireSession } from './middleware/session';
import { adminRouter } from './routes/admin';
import { cableRunsRouter, rigCableRunsRouter } from './routes/cable-runs';
import { devicesRouter } from './routes/devices';
import { clientsRouter } from './routes/clients';
import { emailRouter } from './routes/email';
import { healthRouter } from './routes/health';
import { historyRouter } from './routes/history';
import { hookupsRouter } from './routes/hookups';
import { invitationsRouter } from './routes/invitations';
import { loadsRouter } from './routes/loads';
import { meRouter } from './routes/me';
import { notesRouter } from './routes/notes';
import { peopleRouter } from './routes/people';
import { openApiRouter } from './routes/openapi';
import { projectionsRouter } from './routes/projections';
import { readingsAnalyzeRouter, rigReadingsRouter } from './routes/readings';
import { reportsRouter } from './routes/reports';
import { rigsRouter } from './routes/rigs';
import { solarRouter } from './routes/solar';
import { rigTripsRouter } from './routes/trips';
import { serveWeb } from './web';

export const APP_VERSION = '0.1.0';

/** Builds the whole HTTP app; index.ts only listens. Tests drive this over HTTP with supertest. */
export function createApp(ctx: AppContext): Express {
  const { config, db, logger, auth } = ctx;
  const app = express();
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // Expo's static pages carry small inline scripts; Skia's charts need WebAssembly.
          'script-src': ["'self'", "'unsafe-inline'", "'wasm-unsafe-eval'"],
          'style-src': ["'self'", "'unsafe-inline'"],
          // Photos load from object storage through short-lived signed addresses.
          'img-src': ["'self'", 'data:', 'blob:', new URL(config.S3_ENDPOINT).origin],
          'font-src': ["'self'", 'data:'],
          'connect-src': ["'self'", ...config.TRUSTED_ORIGINS],
          'upgrade-insecure-requests': null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  if (config.TRUSTED_ORIGINS.length) app.use('/api', devCors(config.TRUSTED_ORIGINS));
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));
  // JSON answers go out compressed (brotli or gzip, by the client's Accept-Encoding); a route that sends its
  // own precompressed body (the Outlook) sets Content-Encoding and is left alone. Static files are
  // precompressed at build time (server/web.ts).
  app.use('/api', compression({ threshold: 1024 }));

  // Answers of the API carry private data: no browser, proxy or shared computer keeps a copy.
  app.use('/api', (_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });

  // The auth handler comes before the JSON parser; it sees the client's address from the socket, never from a header the client sent.
  const authHandler = toNodeHandler(auth);
  // A reset request answers after the same time whether or not the address has an account (its e-mail
  // goes out from the job queue; the floor hides the database work that is left).
  const resetHandler = toNodeHandler(async (request: Request) => {
    const started = Date.now();
    const response = await auth.handler(request);
    await new Promise((r) => setTimeout(r, Math.max(0, started + config.RESET_ANSWER_MS - Date.now())));
    return response;
  });
  app.all('/api/auth/{*any}', (req, _res, next) => {
    req.headers[CLIENT_IP_HEADER] = req.socket.remoteAddress ?? 'unknown';
    if (req.method !== 'GET' && req.method !== 'HEAD') forgetCachedSessions();
    next();
  }, authGate, (req, res) => (req.path === '/api/auth/request-password-reset' ? resetHandler(req, res) : authHandler(req, res)));

  app.use('/api', sameOrigin([config.KEYOFF_URL, ...config.TRUSTED_ORIGINS]));
  app.use('/api', express.json({ limit: '1mb' }));
  app.use('/api/health', healthRouter(db, APP_VERSION));
  // One budget per client across every open route (not one each).
  const openLimit = rateLimitedOpen(config.RATE_LIMIT_PER_MINUTE);
  app.use('/api/openapi.json', openLimit, openApiRouter(APP_VERSION));
  app.use('/api/projections', openLimit, projectionsRouter());
  app.use('/api/solar', openLimit, solarRouter());
  app.use('/api/cable-runs', openLimit, cableRunsRouter());
  app.use('/api/hookups', openLimit, hookupsRouter());
  app.use('/api/devices', openLimit, devicesRouter());
  app.use('/api/email', openLimit, express.urlencoded({ extended: false, limit: '10kb' }), emailRouter(ctx));
  app.use('/api/me', requireSession(auth), meRouter(ctx));
  app.use('/api/readings', openLimit, readingsAnalyzeRouter());
  // Everything under /api/rigs is signed in; each route under a rig passes one rigAccess check.
  app.use('/api/rigs', requireSession(auth), rigsRouter(ctx));
  app.use('/api/rigs/:rigId', loadsRouter(ctx), rigCableRunsRouter(ctx), notesRouter(ctx), peopleRouter(ctx), reportsRouter(ctx), historyRouter(ctx), rigReadingsRouter(ctx), rigTripsRouter(ctx));
  app.use('/api/invitations', requireSession(auth), invitationsRouter(ctx));
  app.use('/api/clients', requireSession(auth), clientsRouter(ctx));
  app.use('/api/admin', requireSession(auth), adminRouter(ctx));
  app.use('/api', notFoundApi);

  const serve = config.SERVE_WEB ?? config.NODE_ENV === 'production';
  if (serve) serveWeb(app, config.WEB_DIST);

  app.use(errorHandler);
  return app;
}
