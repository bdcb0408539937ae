import { type Insertable, type Kysely, sql, type Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, EmailKind, EmailPrefsTable } from '@/db/schema';
import type { EnergyUnit } from '@/shared/units';

type Exec = Db | Transaction<Database> | Kysely<Database>;

// E-mail preferences: one row per person, written whole.

/** The recipient's energy unit (unit_prefs, joined as such): amp-hours when they never chose. */
const ENERGY = sql<EnergyUnit>`coalesce(unit_prefs.energy, 'Ah')`;

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
export const ensureEmailRow = (db: Exec, key: EmailKey) => markEmailsQueued(db, [key]);

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

// Who gets what: a person's address with one preference (on unless they turned it off).

/** An account with its name and address, and whether the given e-mails are on for it. */
export function recipient(db: Exec, userId: string, list: 'reports' | 'notes') {
  const column = list === 'reports' ? sql<boolean>`coalesce(email_prefs.reports_on, true)` : sql<boolean>`coalesce(email_prefs.note_emails_on, true)`;
  return db
    .selectFrom('user')
    .leftJoin('email_prefs', 'email_prefs.user_id', 'user.id')
    .leftJoin('unit_prefs', 'unit_prefs.user_id', 'user.id')
    .select(['user.id', 'user.name', 'user.email', column.as('on'), ENERGY.as('energy')])
    .where('user.id', '=', userId)
    .executeTakeFirst();
}

/** Everyone on every rig whose report is on, with their chosen weekday, hour and zone (defaults: Sunday 18:00, UTC). */
export function reportSubscribers(db: Exec) {
  return db
    .selectFrom('rigs')
    .innerJoin('member', 'member.organizationId', 'rigs.household_id')
    .leftJoin('email_prefs', 'email_prefs.user_id', 'member.userId')
    .select([
      'rigs.id as rigId',
      'rigs.name as rigName',
      'rigs.version as version',
      'rigs.power as power',
      'member.userId as userId',
      sql<number>`coalesce(email_prefs.report_weekday, 6)`.as('weekday'),
      sql<number>`coalesce(email_prefs.report_hour, 18)`.as('hour'),
      sql<string>`coalesce(email_prefs.time_zone, 'UTC')`.as('timeZone'),
    ])
    .where(sql<boolean>`coalesce(email_prefs.reports_on, true)`)
    .execute();
}

/** The rig's people with warnings on, with their threshold (tight unless they chose short). */
export function warningRecipients(db: Exec, rigId: string) {
  return db
    .selectFrom('member')
    .innerJoin('rigs', 'rigs.household_id', 'member.organizationId')
    .innerJoin('user', 'user.id', 'member.userId')
    .leftJoin('email_prefs', 'email_prefs.user_id', 'member.userId')
    .leftJoin('unit_prefs', 'unit_prefs.user_id', 'member.userId')
    .select(['user.id as id', 'user.name as name', 'user.email as email', sql<string>`coalesce(email_prefs.warn_at, 'tight')`.as('warnAt'), ENERGY.as('energy')])
    .where('rigs.id', '=', rigId)
    .where(sql<boolean>`coalesce(email_prefs.warnings_on, true)`)
    .execute();
}

/** Which of these keys the log already holds. */
export async function knownEmailKeys(db: Exec, keys: string[]) {
  const known = new Set<string>();
  for (let i = 0; i < keys.length; i += 2000) {
    const rows = await db.selectFrom('email_log').select('idempotency_key').where('idempotency_key', 'in', keys.slice(i, i + 2000)).execute();
    rows.forEach((r) => known.add(r.idempotency_key));
  }
  return known;
}

/** Rows for e-mails queued as jobs, so the next pass does not queue them again. */
export async function markEmailsQueued(db: Exec, keys: EmailKey[]) {
  if (!keys.length) return;
  await db
    .insertInto('email_log')
    .values(keys.map((k) => ({ idempotency_key: k.idempotencyKey, kind: k.kind, user_id: k.userId, rig_id: k.rigId, last_error: null, to_address: null, subject: null, html: null, text: null, chart_png: null, created_at: new Date() })))
    .onConflict((oc) => oc.column('idempotency_key').doNothing())
    .execute();
}

/** The meta of the last e-mail of a kind sent to a person about a rig, other than the given key. */
export async function lastSentMeta(db: Exec, userId: string, rigId: string, kind: EmailKind, exceptKey: string) {
  const row = await db
    .selectFrom('email_log')
    .select('meta')
    .where('user_id', '=', userId)
    .where('rig_id', '=', rigId)
    .where('kind', '=', kind)
    .where('status', '=', 'sent')
    .where('idempotency_key', '!=', exceptKey)
    .orderBy('sent_at', 'desc')
    .executeTakeFirst();
  return row?.meta ?? null;
}

/** The newest note a person was already told of about a rig (the `newestAt` of their note e-mails). */
export async function newestNoteEmailed(db: Exec, userId: string, rigId: string) {
  const row = await db
    .selectFrom('email_log')
    .select(sql<Date | null>`max((meta->>'newestAt')::timestamptz)`.as('newest'))
    .where('user_id', '=', userId)
    .where('rig_id', '=', rigId)
    .where('kind', '=', 'notes')
    .where('status', '=', 'sent')
    .executeTakeFirst();
  return row?.newest ?? null;
}
