import type { Db } from '@/db/client';
import type { Config } from '../config';
import { weekChartPng } from '../emails/chart';
import { HttpError } from '../errors';
import { withoutPersonalLinks } from '../emails/unsubscribe';
import { figuresOf } from '../jobs/figures';
import { reportLetter } from '../jobs/reports';
import type { RigAccess } from '../middleware/rig-access';
import * as email from '../repositories/email';
import { openAdvisorThreads } from '../repositories/notes';
import { loadsOfRigs } from '../repositories/rigs';
import { loadFromRow } from './rigs-model';
import { unitsOf } from './units';

const iso = (d: unknown) => new Date(d as Date).toISOString();

/** The reports, warnings and note e-mails sent about a rig, newest first, with each recipient. */
export async function sentEmailsOf(db: Db, rigId: string) {
  const rows = await email.sentEmailsOfRig(db, rigId);
  return rows.map((r) => ({ id: r.id, kind: r.kind, subject: r.subject ?? '', sentAt: iso(r.sent_at), recipient: { id: r.user_id, name: r.recipient ?? 'someone who left' } }));
}

export async function sentEmail(db: Db, rigId: string, emailId: string) {
  const row = await email.findSentEmail(db, rigId, emailId);
  if (!row) throw new HttpError(404, 'not_found', 'No such e-mail on this rig.');
  // Copies kept before links were taken out at send time lose them here.
  return { ...row, html: row.html === null ? null : withoutPersonalLinks(row.html), text: row.text === null ? null : withoutPersonalLinks(row.text) };
}

/** For an admin: e-mails whose last attempt failed, with the error; no budget figures. */
export async function failedEmails(db: Db) {
  const rows = await email.failedEmails(db);
  return rows.map((r) => ({ id: r.id, kind: r.kind, key: r.idempotency_key, attempts: r.attempts, error: r.last_error, to: r.to_address, createdAt: iso(r.created_at) }));
}

/**
 * The next weekly report as the caller would get it, made now from the rig as it is: the same letter the
 * report job sends (in the caller's energy unit), with its chart inlined, for the Reports screen before
 * anything has been sent.
 */
export async function reportPreview(db: Db, config: Config, rig: RigAccess, user: { id: string; name: string }, now = new Date()) {
  const loads = (await loadsOfRigs(db, [rig.id])).map(loadFromRow);
  const figures = figuresOf(rig, loads);
  const notes = await openAdvisorThreads(db, rig.id);
  const { energy } = await unitsOf(db, user.id);
  const { html } = await reportLetter(config, { ...user, energy }, { rigId: rig.id, weekKey: now.toISOString().slice(0, 10), figures }, undefined, notes);
  const png = weekChartPng(figures.weekSocPercent, figures.cutoffSocPercent, figures.chartStartHourOfWeek);
  return html.replaceAll('cid:week-ahead', `data:image/png;base64,${png.toString('base64')}`);
}
