import { createHmac, timingSafeEqual } from 'node:crypto';

import { deriveKey } from '../security/secrets';

export type MailList = 'reports' | 'warnings' | 'notes';
const LISTS: MailList[] = ['reports', 'warnings', 'notes'];

/** What each kind of e-mail is called in the e-mails and on the unsubscribe page. */
export const LIST_NAME: Record<MailList, string> = { reports: 'weekly reports', warnings: 'low-margin warnings', notes: 'note e-mails' };

/** How long an unsubscribe link works after its e-mail went out (Settings always works). */
export const UNSUBSCRIBE_TOKEN_DAYS = 60;

export type UnsubscribeClaim = { userId: string; list: MailList; expired: boolean };

/**
 * A token that turns one kind of e-mail off for one person until it expires, signed with a key derived
 * from the server's secret (never the secret itself).
 */
export function unsubscribeToken(secret: string, userId: string, list: MailList, issuedAt = new Date()): string {
  const e = Math.floor(issuedAt.getTime() / 1000) + UNSUBSCRIBE_TOKEN_DAYS * 86_400;
  const payload = Buffer.from(JSON.stringify({ u: userId, l: list, e })).toString('base64url');
  return `${payload}.${sign(secret, payload)}`;
}

export function readUnsubscribeToken(secret: string, token: string, now = new Date()): UnsubscribeClaim | null {
  const [payload, sig] = token.split('.');
  if (!payload || !sig) return null;
  const expected = Buffer.from(sign(secret, payload));
  const given = Buffer.from(sig);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  try {
    const { u, l, e } = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8'));
    if (typeof u !== 'string' || !LISTS.includes(l) || typeof e !== 'number') return null;
    return { userId: u, list: l, expired: e * 1000 < now.getTime() };
  } catch {
    return null;
  }
}

const sign = (secret: string, payload: string) => createHmac('sha256', deriveKey(secret, 'unsubscribe')).update(payload).digest('base64url');

/**
 * An e-mail as kept for the Reports screen, which the whole household sees: every personal link (the
 * recipient's unsubscribe link) becomes the Settings page.
 */
export const withoutPersonalLinks = (s: string) => s.replace(/\/api\/email\/unsubscribe\?token=[A-Za-z0-9_.%-]+/g, '/settings');
