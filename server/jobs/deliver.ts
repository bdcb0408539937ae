import { sql } from 'kysely';

import type { EmailKind } from '@/db/schema';
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
  key: { idempotencyKey: string; kind: EmailKind; userId: string; rigId: string | null },
  build: () => Promise<Built | null>,
): Promise<DeliverResult> {
  const { db, mailer, config } = deps;
  await db
    .insertInto('email_log')
    .values({ idempotency_key: key.idempotencyKey, kind: key.kind, user_id: key.userId, rig_id: key.rigId, last_error: null, to_address: null, subject: null, html: null, text: null, chart_png: null, created_at: new Date() })
    .onConflict((oc) => oc.column('idempotency_key').doNothing())
    .execute();
  const claimed = await db
    .updateTable('email_log')
    .set((eb) => ({ status: 'sending', attempts: eb('attempts', '+', 1), locked_at: new Date() }))
    .where('idempotency_key', '=', key.idempotencyKey)
    .where((eb) => eb.or([eb('status', 'in', ['queued', 'failed']), eb.and([eb('status', '=', 'sending'), eb('locked_at', '<', sql<Date>`now() - make_interval(secs => ${config.SEND_LEASE_SECONDS})`)])]))
    .returning(['id', 'status'])
    .executeTakeFirst();
  if (!claimed) {
    const row = await db.selectFrom('email_log').select('status').where('idempotency_key', '=', key.idempotencyKey).executeTakeFirstOrThrow();
    if (row.status === 'sent') return 'already-sent';
    throw new SendInFlight(`e-mail ${key.idempotencyKey} is being sent by another worker`);
  }
  const fail = async (stage: string, err: unknown) => {
    await db
      .updateTable('email_log')
      .set({ status: 'failed', locked_at: null, last_error: `${stage}: ${err instanceof Error ? err.message : String(err)}`.slice(0, 2000) })
      .where('id', '=', claimed.id)
      .execute();
  };
  let mail: Built | null;
  try {
    mail = await build();
  } catch (err) {
    await fail('render', err);
    throw err;
  }
  if (!mail) {
    await db.deleteFrom('email_log').where('id', '=', claimed.id).execute();
    return 'skipped';
  }
  await db
    .updateTable('email_log')
    .set({ to_address: mail.to, subject: mail.subject, html: mail.html, text: mail.text, chart_png: mail.chartPng ?? null, meta: mail.meta === undefined ? null : JSON.stringify(mail.meta) })
    .where('id', '=', claimed.id)
    .execute();
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
  await db.updateTable('email_log').set({ status: 'sent', sent_at: new Date(), locked_at: null, last_error: null }).where('id', '=', claimed.id).execute();
  return 'sent';
}
