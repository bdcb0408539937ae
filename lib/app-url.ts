/** The address the app runs at, for links in e-mail (the page's own origin on the web). */
export function appUrl(path = '/'): string {
  const origin = typeof window !== 'undefined' && window.location ? window.location.origin : (process.env.EXPO_PUBLIC_APP_URL ?? '');
  return origin + path;
}

/** Only a path inside the app may be a place to return to after signing in. */
export function safeNext(next: unknown): string {
  return typeof next === 'string' && next.startsWith('/') && !next.startsWith('//') ? next : '/';
}
