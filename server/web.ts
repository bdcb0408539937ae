import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';

/**
 * Serves the static web export (expo export --platform web) from the same origin as the API.
 * Expo writes one HTML file per route; unknown paths get the export's not-found page with a 404.
 */
export function serveWeb(app: Express, dist: string) {
  const root = path.resolve(dist);
  if (!existsSync(path.join(root, 'index.html'))) {
    throw new Error(`No web build in ${root}: run \`npm run build:web\` first.`);
  }
  app.use(
    express.static(root, {
      extensions: ['html'],
      index: 'index.html',
      setHeaders(res, file) {
        // Hashed bundles never change; HTML must be revalidated so a new build shows at once.
        if (file.includes(`${path.sep}_expo${path.sep}`) || file.endsWith('.wasm')) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        } else {
          res.setHeader('Cache-Control', 'no-cache');
        }
      },
    }),
  );
  const notFound = path.join(root, '+not-found.html');
  app.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    res.status(404);
    if (existsSync(notFound)) res.sendFile(notFound);
    else res.type('text').send('Not found');
  });
}
