import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

import { BASE } from './browser';

// Each kind of file the production server sends, checked over HTTP against the real build in dist/:
// compressed by content negotiation, and cached for good only when its name changes with its content.
const DIST = path.resolve('dist');
const find = (dir: string, re: RegExp) => {
  const hit = readdirSync(path.join(DIST, dir)).find((f) => re.test(f));
  if (!hit) throw new Error(`no ${re} in dist/${dir}`);
  return `/${dir ? `${dir}/` : ''}${hit}`;
};
const IMMUTABLE = 'public, max-age=31536000, immutable';

async function get(url: string, acceptEncoding: string, headers: Record<string, string> = {}) {
  const res = await fetch(BASE + url, { headers: { 'Accept-Encoding': acceptEncoding, ...headers } });
  await res.arrayBuffer();
  return res;
}

describe('the web build over HTTP', () => {
  const kinds = () => [
    { kind: 'a page (clean address)', url: '/sign-in', type: /text\/html/, cache: 'no-cache' },
    { kind: 'a page of a dynamic route', url: '/rigs/some-rig/try', type: /text\/html/, cache: 'no-cache' },
    { kind: 'the entry script', url: find('_expo/static/js/web', /^entry-.*\.js$/), type: /javascript/, cache: IMMUTABLE },
    { kind: "the chart's lazy chunk", url: find('_expo/static/js/web', /^charts-impl-.*\.js$/), type: /javascript/, cache: IMMUTABLE },
    { kind: "the drawings' lazy chunk", url: find('_expo/static/js/web', /^drawings-impl-.*\.js$/), type: /javascript/, cache: IMMUTABLE },
    { kind: 'CanvasKit', url: find('', /^canvaskit\.[0-9a-f]{16}\.wasm$/), type: /application\/wasm/, cache: IMMUTABLE },
    { kind: 'the service worker', url: '/sw.js', type: /javascript/, cache: 'no-cache' },
    { kind: 'the manifest', url: '/manifest.webmanifest', type: /application\/manifest\+json/, cache: 'no-cache' },
  ];

  it('sends brotli, else gzip, else the plain file, always with Vary: Accept-Encoding and the right cache rule', async () => {
    for (const k of kinds()) {
      for (const [accept, encoding] of [['gzip, deflate, br', 'br'], ['gzip', 'gzip'], ['identity', null]] as const) {
        const res = await get(k.url, accept);
        const where = `${k.kind} (${k.url}) with Accept-Encoding: ${accept}`;
        expect(res.status, where).toBe(200);
        expect(res.headers.get('content-encoding'), where).toBe(encoding);
        expect(res.headers.get('vary') ?? '', where).toMatch(/Accept-Encoding/i);
        expect(res.headers.get('content-type'), where).toMatch(k.type);
        expect(res.headers.get('cache-control'), where).toBe(k.cache);
      }
    }
  });

  it('names no file immutable unless its name carries a content hash', async () => {
    // canvaskit.wasm and the fonts used to go out under fixed names; now only hashed names exist.
    expect(readdirSync(DIST)).not.toContain('canvaskit.wasm');
    const sw = readFileSync(path.join(DIST, 'sw.js'), 'utf8');
    for (const url of ['/favicon.ico', '/apple-touch-icon.png', '/sw.js', '/', '/manifest.webmanifest']) {
      expect((await get(url, 'br')).headers.get('cache-control'), url).toBe('no-cache');
    }
    const font = find('assets/assets/fonts', /^Nunito_400Regular\.[0-9a-f]{32}\.woff2$/);
    const res = await get(font, 'gzip, br');
    expect(res.headers.get('content-type')).toBe('font/woff2');
    expect(res.headers.get('content-encoding')).toBeNull(); // woff2 is compressed already
    expect(res.headers.get('cache-control')).toBe(IMMUTABLE);
    expect(sw).toContain(font.slice(1));
  });

  it('gives every page a title, a description, the theme colour and the manifest, whose icons are served', async () => {
    for (const url of ['/', '/sign-in', '/rigs/some-rig', '/settings', '/forgot-password']) {
      const html = await (await fetch(BASE + url)).text();
      expect(html, url).toMatch(/<title[^>]*>([^<]+ · )?Keyoff<\/title>/);
      expect(html, url).toMatch(/<meta name="description" content="[^"]{20,}"/);
      expect(html, url).toContain('<meta name="theme-color" content="#17324A"/>');
      expect(html, url).toContain('<link rel="manifest" href="/manifest.webmanifest"/>');
    }
    expect(await (await fetch(`${BASE}/sign-in`)).text()).toContain('>Sign in · Keyoff</title>');
    const manifest = (await (await fetch(`${BASE}/manifest.webmanifest`)).json()) as { name: string; start_url: string; display: string; icons: { src: string; sizes: string }[] };
    expect(manifest).toMatchObject({ name: 'Keyoff', start_url: '/', display: 'standalone' });
    expect(manifest.icons.map((i) => i.sizes)).toEqual(['192x192', '512x512']);
    for (const icon of manifest.icons) {
      const res = await get(icon.src, 'br');
      expect(res.status, icon.src).toBe(200);
      expect(res.headers.get('content-type')).toBe('image/png');
      expect(res.headers.get('cache-control')).toBe(IMMUTABLE);
    }
  });

  it('answers a page that changed nothing since the last visit with 304', async () => {
    const first = await get('/sign-in', 'br');
    // (fetch marks a request with its own If-None-Match "no-cache" unless told otherwise, as a browser's cache would not.)
    const again = await get('/sign-in', 'br', { 'If-None-Match': first.headers.get('etag')!, 'Cache-Control': 'max-age=0' });
    expect(again.status).toBe(304);
  });

  it('compresses JSON answers from the API and the 404 page', async () => {
    const sign = await fetch(`${BASE}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json', Origin: BASE },
      body: JSON.stringify({ email: 'ines@example.org', password: 'keyoff-demo-2026' }),
    });
    const cookie = sign.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    const rigs = (await (await fetch(`${BASE}/api/rigs`, { headers: { cookie } })).json()) as { rigs: { id: string; name: string }[] };
    // Wren by name: earlier tests may have added small rigs of Ines's. (Answers under 1 KB, such as a short
    // rig list, go out as they are: compressing them saves nothing.)
    const wren = rigs.rigs.find((r) => r.name === 'Wren')!;
    for (const url of [`/api/rigs/${wren.id}`, `/api/rigs/${wren.id}/outlook`]) {
      const res = await get(url, 'gzip, deflate, br', { cookie });
      expect(res.status, url).toBe(200);
      expect(res.headers.get('content-encoding'), url).toMatch(/^(br|gzip)$/);
      expect(res.headers.get('vary') ?? '', url).toMatch(/Accept-Encoding/i);
    }
    const missing = await get('/no-such-page', 'br');
    expect(missing.status).toBe(404);
    expect(missing.headers.get('content-encoding')).toBe('br');
    expect(missing.headers.get('content-type')).toMatch(/text\/html/);
  });
});
