/**
 * Registers the service worker the web build writes (dist/sw.js, see scripts/finish-web.ts) once the page
 * has loaded and the browser is idle, so its precaching never competes with the first screen for a weak
 * signal. Only in a production build: `npm run dev` serves no worker.
 */
export function registerServiceWorker() {
  if (process.env.NODE_ENV !== 'production' || typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const register = () => {
    const idle = (globalThis as { requestIdleCallback?: (cb: () => void, o?: { timeout: number }) => void }).requestIdleCallback;
    const go = () => navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch(() => undefined);
    if (idle) idle(go, { timeout: 5000 });
    else setTimeout(go, 1000);
  };
  if (document.readyState === 'complete') register();
  else window.addEventListener('load', register, { once: true });
}
