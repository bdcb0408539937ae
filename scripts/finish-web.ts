// Finishes the web export in dist/ (run by build_web in scripts/lib.sh after `expo export`):
// 1. canvaskit.wasm renamed by its content hash (the chart's loader was built with that name);
// 2. the app icons and the web app manifest, from assets/brand/icon.svg;
// 3. the service worker (web/service-worker.js, with Workbox's precache list and the route table);
// 4. every compressible file written again beside itself as .br (brotli 11) and .gz (gzip 9).
// Files with a content hash in their name are cached for good by browsers (server/web.ts); every other
// file is revalidated, so nothing here may keep a fixed name and change its content without a new build.
import { createHash } from 'node:crypto';
import { copyFileSync, existsSync, mkdirSync, readdirSync, readFileSync, renameSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { brotliCompressSync, constants, gzipSync } from 'node:zlib';
import { Resvg } from '@resvg/resvg-js';
import { injectManifest } from 'workbox-build';

import { webRoutes } from '@/server/web-routes';
import { colors } from '@/shared/theme';

const dist = path.resolve(process.argv[2] ?? 'dist');
const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;

/** The name a file gets when its content decides it: `canvaskit.wasm` → `canvaskit.<16 hex>.wasm`. */
function hashedName(name: string, content: Buffer) {
  const hash = createHash('sha256').update(content).digest('hex').slice(0, 16);
  const ext = path.extname(name);
  return `${name.slice(0, name.length - ext.length)}.${hash}${ext}`;
}

function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? files(path.join(dir, e.name)) : [path.join(dir, e.name)]));
}

/** 1. The chart's CanvasKit, named by content. The loader's name came from the same hash before the export. */
function hashCanvasKit() {
  const plain = path.join(dist, 'canvaskit.wasm');
  const expected = process.env.EXPO_PUBLIC_CANVASKIT_WASM;
  // Run again on a finished export (after changing this script): already done.
  if (!existsSync(plain) && expected && existsSync(path.join(dist, expected))) return;
  const named = hashedName('canvaskit.wasm', readFileSync(plain));
  if (expected !== named) throw new Error(`canvaskit.wasm hashes to ${named}, but the bundle was built with ${expected ?? 'no name'}`);
  const js = files(path.join(dist, '_expo')).filter((f) => f.endsWith('.js'));
  if (!js.some((f) => readFileSync(f, 'utf8').includes(named))) throw new Error(`no script loads ${named}: is the Metro cache stale?`);
  renameSync(plain, path.join(dist, named));
  console.log(`canvaskit.wasm → ${named}`);
}

/** 2. Icons for the home screen and the manifest that makes the app installable. */
function iconsAndManifest() {
  const svg = readFileSync('assets/brand/icon.svg', 'utf8');
  mkdirSync(path.join(dist, 'icons'), { recursive: true });
  const icons = [192, 512].map((size) => {
    const png = new Resvg(svg, { fitTo: { mode: 'width', value: size } }).render().asPng();
    const name = hashedName(`icon-${size}.png`, png);
    writeFileSync(path.join(dist, 'icons', name), png);
    return { src: `/icons/${name}`, sizes: `${size}x${size}`, type: 'image/png', purpose: 'any' };
  });
  // iOS looks for this one by its fixed name; it is revalidated like the HTML.
  writeFileSync(path.join(dist, 'apple-touch-icon.png'), new Resvg(svg, { fitTo: { mode: 'width', value: 180 } }).render().asPng());
  const manifest = {
    name: 'Keyoff',
    short_name: 'Keyoff',
    description: "A camper's 12 V battery budget: days parked, what drains it, what fixes it.",
    id: '/',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    orientation: 'any',
    background_color: colors.night,
    theme_color: colors.night,
    icons,
  };
  writeFileSync(path.join(dist, 'manifest.webmanifest'), `${JSON.stringify(manifest, null, 2)}\n`);
  console.log(`manifest.webmanifest with ${icons.length} icons`);
}

/** Workbox's own runtime files, copied under names hashed by content (only the modules the worker uses). */
function workboxRuntime(): string[] {
  mkdirSync(path.join(dist, 'workbox'), { recursive: true });
  return ['core', 'routing', 'strategies', 'precaching'].map((m) => {
    const src = require.resolve(`workbox-${m}/build/workbox-${m}.prod.js`);
    const name = hashedName(`workbox-${m}.js`, readFileSync(src));
    copyFileSync(src, path.join(dist, 'workbox', name));
    return `/workbox/${name}`;
  });
}

/**
 * The route table for the worker, each route pointing at a page to precache. Expo renders every signed-in
 * route to the same shell (the session is checked in the browser), so identical pages are precached once.
 */
function pagesToPrecache() {
  // Expo's own route list (_sitemap) is not part of the app.
  const routes = webRoutes(dist).filter((r) => !r.file.startsWith('_'));
  const rank = (f: string) => (f.includes('[') ? 2 : f === 'index.html' ? 0 : 1);
  const canonical = new Map<string, string>();
  const digest = (file: string) => createHash('sha256').update(readFileSync(path.join(dist, file))).digest('hex');
  for (const r of [...routes].sort((a, b) => rank(a.file) - rank(b.file))) {
    if (!canonical.has(digest(r.file))) canonical.set(digest(r.file), r.file);
  }
  return {
    routes: routes.map((r) => ({ pattern: r.pattern.source, page: `/${canonical.get(digest(r.file))}` })),
    globs: [...canonical.values()].map((f) => f.replace(/[[\]]/g, '\\$&')),
  };
}

/** 3. The service worker: the template with the route table and Workbox's precache list filled in. */
async function serviceWorker() {
  const { routes, globs } = pagesToPrecache();
  const template = readFileSync('web/service-worker.js', 'utf8')
    .replace('self.__KEYOFF_WORKBOX', JSON.stringify(workboxRuntime()))
    .replace('self.__KEYOFF_ROUTES', JSON.stringify(routes));
  const swSrc = path.join(os.tmpdir(), `keyoff-sw-${process.pid}.js`);
  writeFileSync(swSrc, template);
  try {
    const { count, size, warnings } = await injectManifest({
      swSrc,
      swDest: path.join(dist, 'sw.js'),
      globDirectory: dist,
      globPatterns: [
        ...globs,
        '_expo/static/**/*.{js,css}',
        'canvaskit.*.wasm',
        'assets/assets/**/*',
        'assets/**/*.{woff2,ttf}',
        'icons/*.png',
        'manifest.webmanifest',
        'favicon.ico',
      ],
      globIgnores: ['**/*.{br,gz}'],
      // Hashed names change with their content: no revision, so the browser's HTTP cache can serve them.
      dontCacheBustURLsMatching: /[.-][0-9a-f]{12,}(@\dx)?\.[a-z0-9]+$/,
      maximumFileSizeToCacheInBytes: 16 * 1024 * 1024,
    });
    warnings.forEach((w) => console.warn(`service worker: ${w}`));
    console.log(`sw.js precaches ${count} files, ${kb(size)} before compression`);
  } finally {
    rmSync(swSrc, { force: true });
  }
}

/** 4. Brotli and gzip beside every file that compresses (images and woff2 already are). */
function precompress() {
  let raw = 0;
  let br = 0;
  for (const file of files(dist)) {
    if (/\.(br|gz|png|jpe?g|webp|woff2)$/.test(file) || path.basename(file).startsWith('.')) continue;
    // Already done on an earlier run over the same export.
    if (existsSync(`${file}.br`) && statSync(`${file}.br`).mtimeMs >= statSync(file).mtimeMs) continue;
    const content = readFileSync(file);
    if (content.length < 256) continue;
    const brotli = brotliCompressSync(content, { params: { [constants.BROTLI_PARAM_QUALITY]: 11, [constants.BROTLI_PARAM_SIZE_HINT]: content.length } });
    const gzip = gzipSync(content, { level: 9 });
    if (brotli.length > content.length * 0.95) continue;
    writeFileSync(`${file}.br`, brotli);
    writeFileSync(`${file}.gz`, gzip);
    raw += content.length;
    br += brotli.length;
  }
  console.log(`precompressed ${kb(raw)} into ${kb(br)} of brotli (and gzip beside it)`);
}

void (async () => {
  if (!statSync(path.join(dist, 'index.html')).isFile()) throw new Error(`no export in ${dist}`);
  hashCanvasKit();
  iconsAndManifest();
  await serviceWorker();
  precompress();
})().catch((err) => {
  console.error(err);
  process.exit(1);
});
