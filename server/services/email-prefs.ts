import type { Db } from '@/db/client';
import { DEFAULT_EMAIL_PREFS, type EmailPrefs } from '@/shared/schemas/email-prefs';
import { type MailList, readUnsubscribeToken } from '../emails/unsubscribe';
import { HttpError } from '../errors';
import { findEmailPrefs, upsertEmailPrefs } from '../repositories/email';
import { findUser } from '../repositories/users';

export async function prefsOf(db: Db, userId: string): Promise<EmailPrefs & { saved: boolean }> {
  const row = await findEmailPrefs(db, userId);
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
  await upsertEmailPrefs(db, userId, values);
  return prefsOf(db, userId);
}

const LIST_FIELD: Record<MailList, keyof EmailPrefs> = { reports: 'reportsOn', warnings: 'warningsOn', notes: 'noteEmailsOn' };
export const turnOff = (db: Db, userId: string, list: MailList) => savePrefs(db, userId, { [LIST_FIELD[list]]: false });

/** One click on an unsubscribe link or header: the signed token says who and which e-mails. */
export async function unsubscribe(db: Db, secret: string, token: string) {
  const who = readUnsubscribeToken(secret, token);
  if (!who) throw new HttpError(400, 'validation_failed', 'This unsubscribe link is not valid.', [{ path: 'token', message: 'The token was changed or is not ours.' }]);
  if (who.expired) throw new HttpError(410, 'expired', 'This unsubscribe link has expired: choose your e-mails in Settings.', [{ path: 'token', message: 'The link has expired.' }]);
  if (!(await findUser(db, who.userId))) throw new HttpError(404, 'not_found', 'No such account.');
  await turnOff(db, who.userId, who.list);
  return who;
}
