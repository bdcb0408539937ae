import { readdirSync } from 'node:fs';
import path from 'node:path';

export type WebRoute = { pattern: RegExp; file: string; dynamic: number };

/**
 * The static export's HTML files as routes: `settings.html` answers `/settings`, `rigs/[rigId]/people.html`
 * answers `/rigs/<any>/people`. Static routes first, then by how dynamic they are. The server serves pages
 * by it (server/web.ts) and the service worker finds a page offline by it (scripts/finish-web.ts).
 */
export function webRoutes(root: string): WebRoute[] {
  const out: WebRoute[] = [];
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) {
        if (entry.name !== '_expo' && entry.name !== 'assets') walk(full);
        continue;
      }
      const rel = path.relative(root, full).split(path.sep).join('/');
      // Route groups such as (app) are exported twice; their copies are never addressed. +not-found is the 404 page.
      if (!entry.name.endsWith('.html') || rel.includes('(') || rel.startsWith('+') || rel.includes('/+')) continue;
      const route = rel.replace(/\.html$/, '').replace(/(^|\/)index$/, '');
      let dynamic = 0;
      const source = route
        .split('/')
        .filter(Boolean)
        .map((seg) => {
          if (/^\[\.\.\..+\]$/.test(seg)) return (dynamic += 10), '.+';
          if (/^\[.+\]$/.test(seg)) return (dynamic += 1), '[^/]+';
          return seg.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
        })
        .join('/');
      out.push({ pattern: new RegExp(`^/${source}/?$`), file: rel, dynamic });
    }
  };
  walk(root);
  return out.sort((a, b) => a.dynamic - b.dynamic);
}
