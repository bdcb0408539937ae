import { existsSync } from 'node:fs';
import path from 'node:path';
import type { Express, Response } from 'express';
import expressStaticGzip from 'express-static-gzip';

import { webRoutes } from './web-routes';

/** A build file whose name carries its content hash (`entry-<hash>.js`, `canvaskit.<hash>.wasm`). */
const HASHED = /[.-][0-9a-f]{12,}\.[a-z0-9]+$/i;

/**
 * How long a browser may keep a file: for good when its name changes with its content, otherwise it asks
 * again each time (an ETag makes that a 304): HTML, the manifest, the service worker, the favicon.
 */
export function cacheControlFor(file: string): string {
  const name = path.basename(file).replace(/\.(br|gz)$/, '');
  return HASHED.test(name) ? 'public, max-age=31536000, immutable' : 'no-cache';
}

/**
 * Serves the static web export (expo export --platform web, finished by scripts/finish-web.ts) from the
 * same origin as the API. Every file goes out precompressed (brotli or gzip, written beside it at build
 * time) by content negotiation, with `Vary: Accept-Encoding`. Expo writes one HTML file per route; a
 * clean address is mapped onto its file first, so pages are negotiated like the rest; anything else gets
 * the export's not-found page with a 404.
 */
export function serveWeb(app: Express, dist: string) {
  const root = path.resolve(dist);
  if (!existsSync(path.join(root, 'index.html'))) {
    throw new Error(`No web build in ${root}: run \`npm run build:web\` first.`);
  }
  const routes = webRoutes(root);
  const setHeaders = (res: Response, file: string) => {
    res.setHeader('Cache-Control', cacheControlFor(file));
    // The service worker must be able to control every route.
    if (path.basename(file).startsWith('sw.js')) res.setHeader('Service-Worker-Allowed', '/');
  };
  app.use((req, _res, next) => {
    if ((req.method !== 'GET' && req.method !== 'HEAD') || req.path.startsWith('/api/') || path.extname(req.path)) return next();
    const match = routes.find((r) => r.pattern.test(req.path));
    if (match) req.url = '/' + match.file + (req.url.includes('?') ? req.url.slice(req.url.indexOf('?')) : '');
    next();
  });
  app.use(expressStaticGzip(root, { enableBrotli: true, orderPreference: ['br'], index: 'index.html', serveStatic: { setHeaders: setHeaders as never, index: false } }));
  const notFound = path.join(root, '+not-found.html');
  app.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    res.status(404).setHeader('Cache-Control', 'no-cache');
    if (!existsSync(notFound)) return res.type('text').send('Not found');
    res.setHeader('Vary', 'Accept-Encoding');
    const encoding = req.acceptsEncodings('br', 'gzip', 'identity');
    const ext = encoding === 'br' ? '.br' : encoding === 'gzip' ? '.gz' : '';
    if (!ext || !existsSync(notFound + ext)) return res.sendFile(notFound);
    res.setHeader('Content-Encoding', encoding as string);
    res.type('html').sendFile(notFound + ext);
  });
}
