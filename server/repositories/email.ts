import { type Insertable, type Kysely, sql, type Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, EmailKind, EmailPrefsTable } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;

// E-mail preferences: one row per person, written whole.

export const findEmailPrefs = (db: Exec, userId: string) => db.selectFrom('email_prefs').selectAll().where('user_id', '=', userId).executeTakeFirst();

export async function upsertEmailPrefs(db: Exec, userId: string, values: Omit<Insertable<EmailPrefsTable>, 'user_id'>) {
  await db
    .insertInto('email_prefs')
    .values({ user_id: userId, ...values })
    .onConflict((oc) => oc.column('user_id').doUpdateSet(values))
    .execute();
}

// The e-mail log: one row per idempotency key, claimed before a send and marked sent after it.

export type EmailKey = { idempotencyKey: string; kind: EmailKind; userId: string; rigId: string | null };

/** The key's row, made queued if it is not there yet. */
export async function ensureEmailRow(db: Exec, key: EmailKey) {
  await db
    .insertInto('email_log')
    .values({ idempotency_key: key.idempotencyKey, kind: key.kind, user_id: key.userId, rig_id: key.rigId, last_error: null, to_address: null, subject: null, html: null, text: null, chart_png: null, created_at: new Date() })
    .onConflict((oc) => oc.column('idempotency_key').doNothing())
    .execute();
}

/** Claims the key's row for a send: queued or failed, or sending with its lease run out. Undefined when another holds it or it is sent. */
export function claimEmail(db: Exec, idempotencyKey: string, leaseSeconds: number) {
  return db
    .updateTable('email_log')
    .set((eb) => ({ status: 'sending', attempts: eb('attempts', '+', 1), locked_at: new Date() }))
    .where('idempotency_key', '=', idempotencyKey)
    .where((eb) => eb.or([eb('status', 'in', ['queued', 'failed']), eb.and([eb('status', '=', 'sending'), eb('locked_at', '<', sql<Date>`now() - make_interval(secs => ${leaseSeconds})`)])]))
    .returning(['id', 'status'])
    .executeTakeFirst();
}

export async function emailStatus(db: Exec, idempotencyKey: string) {
  return (await db.selectFrom('email_log').select('status').where('idempotency_key', '=', idempotencyKey).executeTakeFirstOrThrow()).status;
}

export async function markEmailFailed(db: Exec, id: string, error: string) {
  await db.updateTable('email_log').set({ status: 'failed', locked_at: null, last_error: error.slice(0, 2000) }).where('id', '=', id).execute();
}

export async function dropEmail(db: Exec, id: string) {
  await db.deleteFrom('email_log').where('id', '=', id).execute();
}

export async function recordEmailContent(db: Exec, id: string, mail: { to: string; subject: string; html: string; text: string; chartPng: Buffer | null; meta: unknown }) {
  await db
    .updateTable('email_log')
    .set({ to_address: mail.to, subject: mail.subject, html: mail.html, text: mail.text, chart_png: mail.chartPng, meta: mail.meta === undefined ? null : JSON.stringify(mail.meta) })
    .where('id', '=', id)
    .execute();
}

export async function markEmailSent(db: Exec, id: string) {
  await db.updateTable('email_log').set({ status: 'sent', sent_at: new Date(), locked_at: null, last_error: null }).where('id', '=', id).execute();
}

// Reading the log back.

/** The e-mails sent about a rig, newest first (at most 200), with each recipient's name. */
export function sentEmailsOfRig(db: Exec, rigId: string) {
  return db
    .selectFrom('email_log')
    .leftJoin('user', 'user.id', 'email_log.user_id')
    .select(['email_log.id', 'email_log.kind', 'email_log.subject', 'email_log.sent_at', 'email_log.user_id', 'user.name as recipient'])
    .where('email_log.rig_id', '=', rigId)
    .where('email_log.status', '=', 'sent')
    .orderBy('email_log.sent_at', 'desc')
    .limit(200)
    .execute();
}

export function findSentEmail(db: Exec, rigId: string, emailId: string) {
  return db
    .selectFrom('email_log')
    .select(['id', 'subject', 'html', 'text', 'chart_png', 'sent_at'])
    .where('rig_id', '=', rigId)
    .where('id', '=', emailId)
    .where('status', '=', 'sent')
    .executeTakeFirst();
}

/** E-mails whose last attempt failed, newest first (at most 200). */
export function failedEmails(db: Exec) {
  return db
    .selectFrom('email_log')
    .select(['id', 'kind', 'idempotency_key', 'attempts', 'last_error', 'to_address', 'created_at'])
    .where('status', '=', 'failed')
    .orderBy('created_at', 'desc')
    .limit(200)
    .execute();
}
