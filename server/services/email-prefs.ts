import type { Db } from '@/db/client';
import { DEFAULT_EMAIL_PREFS, type EmailPrefs } from '@/shared/schemas/email-prefs';
import type { MailList } from '../emails/unsubscribe';

export async function prefsOf(db: Db, userId: string): Promise<EmailPrefs & { saved: boolean }> {
  const row = await db.selectFrom('email_prefs').selectAll().where('user_id', '=', userId).executeTakeFirst();
  if (!row) return { ...DEFAULT_EMAIL_PREFS, saved: false };
  return {
    reportsOn: row.reports_on,
    reportWeekday: row.report_weekday,
    reportHour: row.report_hour,
    timeZone: row.time_zone,
    warningsOn: row.warnings_on,
    warnAt: row.warn_at,
    noteEmailsOn: row.note_emails_on,
    saved: true,
  };
}

export async function savePrefs(db: Db, userId: string, p: Partial<EmailPrefs>) {
  const current = await prefsOf(db, userId);
  const next = { ...current, ...p };
  const values = {
    reports_on: next.reportsOn,
    report_weekday: next.reportWeekday,
    report_hour: next.reportHour,
    time_zone: next.timeZone,
    warnings_on: next.warningsOn,
    warn_at: next.warnAt,
    note_emails_on: next.noteEmailsOn,
    updated_at: new Date(),
  };
  await db.insertInto('email_prefs').values({ user_id: userId, ...values }).onConflict((oc) => oc.column('user_id').doUpdateSet(values)).execute();
  return prefsOf(db, userId);
}

const LIST_FIELD: Record<MailList, keyof EmailPrefs> = { reports: 'reportsOn', warnings: 'warningsOn', notes: 'noteEmailsOn' };
export const turnOff = (db: Db, userId: string, list: MailList) => savePrefs(db, userId, { [LIST_FIELD[list]]: false });
