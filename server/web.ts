import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';

/** The static export's HTML files as routes: `rigs/[rigId]/people.html` answers `/rigs/<any>/people`. */
export function dynamicRoutes(root: string): { pattern: RegExp; file: string; dynamic: number }[] {
  const out: { pattern: RegExp; file: string; dynamic: number }[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) {
        if (entry.name !== '_expo' && entry.name !== 'assets') walk(full);
        continue;
      }
      // Route groups such as (app) are exported twice; their copies are never addressed.
      if (!entry.name.endsWith('.html') || !full.includes('[') || path.relative(root, full).includes('(')) continue;
      const rel = path.relative(root, full).replace(/\.html$/, '').replace(/(^|\/)index$/, '');
      let dynamic = 0;
      const source = rel
        .split('/')
        .map((seg) => {
          if (/^\[\.\.\..+\]$/.test(seg)) return (dynamic += 10), '.+';
          if (/^\[.+\]$/.test(seg)) return (dynamic += 1), '[^/]+';
          return seg.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
        })
        .join('/');
      out.push({ pattern: new RegExp(`^/${source}/?$`), file: full, dynamic });
    }
  };
  walk(root);
  return out.sort((a, b) => a.dynamic - b.dynamic);
}

/**
 * Serves the static web export (expo export --platform web) from the same origin as the API.
 * Expo writes one HTML file per route; dynamic routes match their [param] files; the rest get the
 * export's not-found page with a 404.
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
  const routes = dynamicRoutes(root);
  const notFound = path.join(root, '+not-found.html');
  app.use((req, res, next) => {
    if (req.method !== 'GET' && req.method !== 'HEAD') return next();
    const match = routes.find((r) => r.pattern.test(req.path));
    if (match) {
      res.setHeader('Cache-Control', 'no-cache');
      return res.sendFile(match.file);
    }
    res.status(404);
    if (existsSync(notFound)) res.sendFile(notFound);
    else res.type('text').send('Not found');
  });
}
