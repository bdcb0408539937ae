import type { Db } from '@/db/client';
import { HttpError } from '../errors';

/** The reports, warnings and note e-mails sent about a rig, newest first, with each recipient. */
export async function sentEmailsOf(db: Db, rigId: string) {
  const rows = await db
    .selectFrom('email_log')
    .leftJoin('user', 'user.id', 'email_log.user_id')
    .select(['email_log.id', 'email_log.kind', 'email_log.subject', 'email_log.sent_at', 'email_log.user_id', 'user.name as recipient'])
    .where('email_log.rig_id', '=', rigId)
    .where('email_log.status', '=', 'sent')
    .orderBy('email_log.sent_at', 'desc')
    .limit(200)
    .execute();
  return rows.map((r) => ({ id: r.id, kind: r.kind, subject: r.subject ?? '', sentAt: new Date(r.sent_at as unknown as Date).toISOString(), recipient: { id: r.user_id, name: r.recipient ?? 'someone who left' } }));
}

export async function sentEmail(db: Db, rigId: string, emailId: string) {
  const row = await db.selectFrom('email_log').select(['id', 'subject', 'html', 'text', 'chart_png', 'sent_at']).where('rig_id', '=', rigId).where('id', '=', emailId).where('status', '=', 'sent').executeTakeFirst();
  if (!row) throw new HttpError(404, 'not_found', 'No such e-mail on this rig.');
  return row;
}

/** For an admin: e-mails whose last attempt failed, with the error; no budget figures. */
export async function failedEmails(db: Db) {
  const rows = await db
    .selectFrom('email_log')
    .select(['id', 'kind', 'idempotency_key', 'attempts', 'last_error', 'to_address', 'created_at'])
    .where('status', '=', 'failed')
    .orderBy('created_at', 'desc')
    .limit(200)
    .execute();
  return rows.map((r) => ({ id: r.id, kind: r.kind, key: r.idempotency_key, attempts: r.attempts, error: r.last_error, to: r.to_address, createdAt: new Date(r.created_at as unknown as Date).toISOString() }));
}
