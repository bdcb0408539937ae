import { claimEmail, dropEmail, type EmailKey, emailStatus, ensureEmailRow, markEmailFailed, markEmailSent, recordEmailContent } from '../repositories/email';
import { withoutPersonalLinks } from '../emails/unsubscribe';
import type { JobDeps } from './types';

export type Built = { to: string; subject: string; html: string; text: string; chartPng?: Buffer; meta?: unknown; headers?: Record<string, string> };
export type DeliverResult = 'sent' | 'already-sent' | 'skipped';

/** Thrown when another worker holds the send; pg-boss retries the job later. */
export class SendInFlight extends Error {}

/**
 * Sends one e-mail at most once for its idempotency key (person, rig, week or transition):
 * the key's row in email_log is claimed before the send and marked sent after it, so a retried or
 * duplicated job finds it sent. A failure is written on the row (visible to an admin) and rethrown
 * so that pg-boss retries with backoff. A send that crashed half-way holds its claim for
 * SEND_LEASE_SECONDS, then may be tried again.
 * `build` returns null when there is nothing to send any more (the person turned it off).
 */
export async function deliver(
  deps: JobDeps,
  key: EmailKey,
  build: () => Promise<Built | null>,
): Promise<DeliverResult> {
  const { db, mailer, config } = deps;
  await ensureEmailRow(db, key);
  const claimed = await claimEmail(db, key.idempotencyKey, config.SEND_LEASE_SECONDS);
  if (!claimed) {
    if ((await emailStatus(db, key.idempotencyKey)) === 'sent') return 'already-sent';
    throw new SendInFlight(`e-mail ${key.idempotencyKey} is being sent by another worker`);
  }
  const fail = (stage: string, err: unknown) => markEmailFailed(db, claimed.id, `${stage}: ${err instanceof Error ? err.message : String(err)}`);
  let mail: Built | null;
  try {
    mail = await build();
  } catch (err) {
    await fail('render', err);
    throw err;
  }
  if (!mail) {
    await dropEmail(db, claimed.id);
    return 'skipped';
  }
  // The household sees the kept copy on the Reports screen: it keeps no personal link.
  await recordEmailContent(db, claimed.id, { to: mail.to, subject: mail.subject, html: withoutPersonalLinks(mail.html), text: withoutPersonalLinks(mail.text), chartPng: mail.chartPng ?? null, meta: mail.meta });
  try {
    await mailer.send({
      to: mail.to,
      subject: mail.subject,
      html: mail.html,
      text: mail.text,
      headers: { ...mail.headers, 'X-Keyoff-Key': key.idempotencyKey },
      attachments: mail.chartPng ? [{ filename: 'week-ahead.png', content: mail.chartPng, cid: 'week-ahead', contentType: 'image/png' }] : undefined,
    });
  } catch (err) {
    await fail('send', err);
    throw err;
  }
  await markEmailSent(db, claimed.id);
  return 'sent';
}
