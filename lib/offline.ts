import { useSyncExternalStore } from 'react';

// What the service worker (web/service-worker.js) tells the page: an API answer it took from its cache
// because the network failed carries this header; its Date header is when the server sent it.
export const FROM_CACHE_HEADER = 'x-keyoff-from-cache';
/** The service worker's cache of API answers (rig lists, rigs, Outlooks, the session's account). */
export const API_CACHE = 'keyoff-api';

const servedFromCache = new Map<string, string>();
const listeners = new Set<() => void>();

/** Notes whether an API answer came from the device's cache, and from when. */
export function noteAnswer(path: string, res: Response) {
  const before = servedFromCache.get(path);
  if (res.headers.get(FROM_CACHE_HEADER)) servedFromCache.set(path, res.headers.get('date') ?? new Date(0).toUTCString());
  else servedFromCache.delete(path);
  if (before !== servedFromCache.get(path)) listeners.forEach((l) => l());
}

const subscribe = (l: () => void) => {
  listeners.add(l);
  return () => listeners.delete(l);
};

/** When the answer for this API path was sent, if what the screen shows came from the device's cache; else null. */
export function useCachedSince(path: string): Date | null {
  const at = useSyncExternalStore(subscribe, () => servedFromCache.get(path) ?? null, () => null);
  return at ? new Date(at) : null;
}

/** Forgets every saved API answer (signing out): the next person on this device sees nothing of the last. */
export async function clearOfflineAnswers() {
  servedFromCache.clear();
  listeners.forEach((l) => l());
  if (typeof caches !== 'undefined') await caches.delete(API_CACHE).catch(() => false);
}
