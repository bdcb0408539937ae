/**
 * Registers the service worker the web build writes (dist/sw.js, see scripts/finish-web.ts) once the page
 * has loaded and the browser is idle, so its precaching never competes with the first screen for a weak
 * signal. Only in a production build: `npm run dev` serves no worker. `onFirstControl` runs when a worker
 * takes charge of a page that had none (a first visit): the screen's answers are asked for again through
 * it, so they are kept for offline at once rather than from the next visit on.
 */
export function registerServiceWorker(onFirstControl?: () => void) {
  if (process.env.NODE_ENV !== 'production' || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const sw = navigator.serviceWorker;
  if (!sw.controller && onFirstControl) sw.addEventListener('controllerchange', onFirstControl, { once: true });
  const register = () => {
    const idle = (globalThis as { requestIdleCallback?: (cb: () => void, o?: { timeout: number }) => void }).requestIdleCallback;
    const go = () => sw.register('/sw.js', { scope: '/' }).catch(() => undefined);
    if (idle) idle(go, { timeout: 5000 });
    else setTimeout(go, 1000);
  };
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}
