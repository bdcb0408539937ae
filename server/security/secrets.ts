import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { randomBytes, hkdfSync } from 'node:crypto';
import { dirname } from 'node:path';

/** The local development default: known to everyone who has the repository, so production refuses it. */
export const DEFAULT_AUTH_SECRET = 'keyoff-local-development-secret-change-me-0123456789';
export const MIN_SECRET_LENGTH = 32;

/**
 * A key for one purpose, derived from AUTH_SECRET with HKDF-SHA256 and a label: better-auth signs
 * sessions with the secret itself, every token of our own (unsubscribe links) with a key of its own, so
 * that one kind of token can never be passed off as another.
 */
export function deriveKey(secret: string, label: string): Buffer {
  return Buffer.from(hkdfSync('sha256', secret, 'keyoff', `keyoff:${label}:v1`, 32));
}

/**
 * The secret `npm start` (and the browser tests' server) use when AUTH_SECRET is not set: made once at
 * random and kept in a file only its owner can read (.data/ is gitignored).
 */
export function localAuthSecret(file: string): string {
  if (existsSync(file)) {
    chmodSync(file, 0o600);
    const secret = readFileSync(file, 'utf8').trim();
    if (secret.length >= MIN_SECRET_LENGTH) return secret;
  }
  mkdirSync(dirname(file), { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  chmodSync(file, 0o600);
  return secret;
}
