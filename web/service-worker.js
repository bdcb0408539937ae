/* global importScripts, workbox */
// Keyoff's service worker. scripts/finish-web.ts fills in the placeholders at build time (Workbox's
// injectManifest for the precache list) and writes it to dist/sw.js; it is plain JavaScript, never bundled.
//
// - Precached (app shell): the route pages, the JavaScript (the chart's chunk too), canvaskit.wasm, the
//   fonts and icons. Files with a hash in their name come from the HTTP cache when the page already loaded them.
// - Pages: the precached page of the route (a reload offline works; a new build's worker brings new pages).
// - Rig lists, rigs, Outlooks and the signed-in account: the network first, else the last answer, marked
//   with a header the page shows as "Offline: figures from <time>". Signing out deletes that cache.
// - Everything else (writes, other API reads) goes to the network only: a save offline fails at once.
importScripts(...self.__KEYOFF_WORKBOX);
workbox.core.setCacheNameDetails({ prefix: 'keyoff' });

const ROUTES = self.__KEYOFF_ROUTES.map((r) => ({ pattern: new RegExp(r.pattern), page: r.page }));
const API_CACHE = 'keyoff-api';
const FROM_CACHE_HEADER = 'x-keyoff-from-cache';
const API_TIMEOUT_S = 8;

workbox.precaching.precacheAndRoute(self.__WB_MANIFEST, { cleanURLs: false, directoryIndex: null });
workbox.precaching.cleanupOutdatedCaches();
self.addEventListener('install', () => self.skipWaiting());
workbox.core.clientsClaim();

/** The precached page that renders this address (the same table the server uses, server/web.ts). */
function pageFor(pathname) {
  const path = pathname.length > 1 ? pathname.replace(/\/$/, '') : pathname;
  const hit = ROUTES.find((r) => r.pattern.test(path));
  return hit ? hit.page : null;
}

// Pages come from the precache at once: they hold no figures (the screen asks the API for those), and a
// new build brings a new worker with new pages, which takes over at the next visit.
workbox.routing.registerRoute(
  ({ request, url }) => request.mode === 'navigate' && url.origin === self.location.origin && !url.pathname.startsWith('/api/'),
  async ({ request, url }) => {
    const page = pageFor(url.pathname);
    const cached = page ? await workbox.precaching.matchPrecache(page) : undefined;
    return cached || fetch(request);
  },
);

const markFromCache = {
  cachedResponseWillBeUsed: async ({ cachedResponse }) => {
    if (!cachedResponse) return cachedResponse;
    const headers = new Headers(cachedResponse.headers);
    headers.set(FROM_CACHE_HEADER, '1');
    return new Response(await cachedResponse.blob(), { status: cachedResponse.status, statusText: cachedResponse.statusText, headers });
  },
};

const OFFLINE_READABLE = [/^\/api\/me$/, /^\/api\/rigs$/, /^\/api\/rigs\/[^/]+$/, /^\/api\/rigs\/[^/]+\/outlook$/];
workbox.routing.registerRoute(
  ({ url, request }) => request.method === 'GET' && url.origin === self.location.origin && OFFLINE_READABLE.some((p) => p.test(url.pathname)),
  new workbox.strategies.NetworkFirst({
    cacheName: API_CACHE,
    networkTimeoutSeconds: API_TIMEOUT_S,
    matchOptions: { ignoreVary: true },
    plugins: [markFromCache],
  }),
);
