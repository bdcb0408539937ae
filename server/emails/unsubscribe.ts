import { createHmac, timingSafeEqual } from 'node:crypto';

export type MailList = 'reports' | 'warnings' | 'notes';
const LISTS: MailList[] = ['reports', 'warnings', 'notes'];

/** What each kind of e-mail is called in the e-mails and on the unsubscribe page. */
export const LIST_NAME: Record<MailList, string> = { reports: 'weekly reports', warnings: 'low-margin warnings', notes: 'note e-mails' };

/** A token that turns one kind of e-mail off for one person, signed with the server's secret; it never expires. */
export function unsubscribeToken(secret: string, userId: string, list: MailList): string {
  const payload = Buffer.from(JSON.stringify({ u: userId, l: list })).toString('base64url');
  return `${payload}.${sign(secret, payload)}`;
}

export function readUnsubscribeToken(secret: string, token: string): { userId: string; list: MailList } | null {
  const [payload, sig] = token.split('.');
  if (!payload || !sig) return null;
  const expected = Buffer.from(sign(secret, payload));
  const given = Buffer.from(sig);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  try {
    const { u, l } = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8'));
    if (typeof u !== 'string' || !LISTS.includes(l)) return null;
    return { userId: u, list: l };
  } catch {
    return null;
  }
}

const sign = (secret: string, payload: string) => createHmac('sha256', `${secret}:unsubscribe`).update(payload).digest('base64url');
