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

export async function apiFetch<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  const res = await fetch(base + path, {
    ...rest,
    credentials: 'include',
    headers: { Accept: 'application/json', ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}), ...headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  const text = await res.text();
  const body = text ? JSON.parse(text) : undefined;
  if (!res.ok) {
    throw new ApiError(res.status, body?.code ?? 'error', body?.message ?? res.statusText, body?.fields ?? []);
  }
  return body as T;
}
