import { noteAnswer } from './offline';

// One fetch wrapper for every feature: same origin in production, EXPO_PUBLIC_API_URL in `npm run dev`.
const base = process.env.EXPO_PUBLIC_API_URL ?? '';

/** The full address of an API path, for what is not fetched as JSON (an e-mail shown in a frame). */
export const apiUrl = (path: string) => base + path;

/** A problem-style error from the API, with the fields that were wrong. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: { path: string; message: string }[] = [],
  ) {
    super(message);
  }
}

/** Said when there is no connection: a read has nothing saved on this device, a write was not sent. */
export const OFFLINE_READ = 'No connection, and this device has nothing saved for this screen yet.';
export const OFFLINE_WRITE = 'No connection: this was not saved. What you typed is still here; try again when you have signal.';
// A write on a very weak signal gives up after this, so nothing spins forever (uploads of big files excepted).
const WRITE_TIMEOUT_MS = 45_000;

export async function apiFetch<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  const write = (rest.method ?? 'GET') !== 'GET';
  let res: Response;
  try {
    res = await fetch(base + path, {
      ...rest,
      credentials: 'include',
      headers: { Accept: 'application/json', ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
      signal: rest.signal ?? (write && json !== undefined && typeof AbortSignal.timeout === 'function' ? AbortSignal.timeout(WRITE_TIMEOUT_MS) : undefined),
    });
  } catch (err) {
    // fetch rejects only when nothing came back: no connection (or the time ran out on a write).
    if (err instanceof Error && err.name === 'AbortError' && rest.signal?.aborted) throw err;
    throw new ApiError(0, 'offline', write ? OFFLINE_WRITE : OFFLINE_READ);
  }
  noteAnswer(path, res);
  const text = await res.text();
  const body = text ? JSON.parse(text) : undefined;
  if (!res.ok) {
    throw new ApiError(res.status, body?.code ?? 'error', body?.message ?? res.statusText, body?.fields ?? []);
  }
  return body as T;
}
