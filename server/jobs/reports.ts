import { sql } from 'kysely';

import { FIX_WIRING_CAUTION, needsWiringCaution } from '@/shared/safety';
import { weekChartPng } from '../emails/chart';
import { renderLetter } from '../emails/render';
import { footerFor, listHeaders } from '../emails/links';
import { deliver } from './deliver';
import { daysText, figuresOfRigs, type RigFigures, STATE_WORD } from './figures';
import type { Jobs } from './queue';
import { reportDue } from './schedule';
import { type JobDeps, QUEUES } from './types';

export type ReportJob = { userId: string; rigId: string; weekKey: string; scheduledFor: string; figures: RigFigures };
export const reportKey = (userId: string, rigId: string, weekKey: string) => `report:${userId}:${rigId}:${weekKey}`;

/** Everyone on every rig whose report is on, with their chosen hour and zone (defaults: Sunday 18:00, UTC). */
async function subscribers(deps: JobDeps) {
  return deps.db
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

/**
 * The schedule: every report whose hour has come (in its person's zone) and that has not been queued
 * yet. Figures are computed once per rig, then the send jobs go to pg-boss in batches. Returns how many.
 */
export async function enqueueDueReports(deps: JobDeps, jobs: Pick<Jobs, 'boss'>, at: Date): Promise<number> {
  const due = (await subscribers(deps)).flatMap((s) => {
    const d = reportDue(at, { timeZone: s.timeZone, weekday: s.weekday, hour: s.hour });
    return d ? [{ ...s, weekKey: d.weekKey, scheduledFor: d.instant.toISOString(), key: reportKey(s.userId, s.rigId, d.weekKey) }] : [];
  });
  if (!due.length) return 0;
  const known = new Set<string>();
  for (let i = 0; i < due.length; i += 2000) {
    const rows = await deps.db.selectFrom('email_log').select('idempotency_key').where('idempotency_key', 'in', due.slice(i, i + 2000).map((d) => d.key)).execute();
    rows.forEach((r) => known.add(r.idempotency_key));
  }
  const fresh = due.filter((d) => !known.has(d.key));
  if (!fresh.length) return 0;
  const rigs = [...new Map(fresh.map((d) => [d.rigId, { id: d.rigId, name: d.rigName, version: d.version, power: d.power }])).values()];
  const figures = await figuresOfRigs(deps.db, rigs);
  for (let i = 0; i < fresh.length; i += 1000) {
    const chunk = fresh.slice(i, i + 1000);
    await jobs.boss.insert(
      chunk.map((d) => ({
        name: QUEUES.reportSend,
        data: { userId: d.userId, rigId: d.rigId, weekKey: d.weekKey, scheduledFor: d.scheduledFor, figures: figures.get(d.rigId)! } satisfies ReportJob,
        retryLimit: deps.config.JOB_RETRY_LIMIT,
        retryDelay: deps.config.JOB_RETRY_DELAY_SECONDS,
        retryBackoff: true,
      })),
    );
    // Marks them queued so the next tick does not queue them again; a duplicate still sends once (deliver).
    await deps.db
      .insertInto('email_log')
      .values(chunk.map((d) => ({ idempotency_key: d.key, kind: 'report' as const, user_id: d.userId, rig_id: d.rigId, last_error: null, to_address: null, subject: null, html: null, text: null, chart_png: null, created_at: new Date() })))
      .onConflict((oc) => oc.column('idempotency_key').doNothing())
      .execute();
  }
  deps.logger.info({ at: at.toISOString(), queued: fresh.length }, 'weekly reports queued');
  return fresh.length;
}

/** Open threads an advisor started on the rig. */
async function openAdvisorNotes(deps: JobDeps, rigId: string) {
  return deps.db
    .selectFrom('notes')
    .innerJoin('rigs', 'rigs.id', 'notes.rig_id')
    .innerJoin('member', (j) => j.onRef('member.organizationId', '=', 'rigs.household_id').onRef('member.userId', '=', 'notes.author_id'))
    .leftJoin('user', 'user.id', 'notes.author_id')
    .select(['notes.body as body', 'user.name as author'])
    .where('notes.rig_id', '=', rigId)
    .where('notes.parent_id', 'is', null)
    .where('notes.resolved_at', 'is', null)
    .where('member.role', '=', 'advisor')
    .orderBy('notes.created_at', 'desc')
    .limit(3)
    .execute();
}

export async function sendReport(deps: JobDeps, job: ReportJob) {
  const { db, config } = deps;
  return deliver(deps, { idempotencyKey: reportKey(job.userId, job.rigId, job.weekKey), kind: 'report', userId: job.userId, rigId: job.rigId }, async () => {
    const user = await db
      .selectFrom('user')
      .leftJoin('email_prefs', 'email_prefs.user_id', 'user.id')
      .select(['user.id', 'user.name', 'user.email', sql<boolean>`coalesce(email_prefs.reports_on, true)`.as('on')])
      .where('user.id', '=', job.userId)
      .executeTakeFirst();
    const stillMember = await db
      .selectFrom('rigs')
      .innerJoin('member', 'member.organizationId', 'rigs.household_id')
      .select('rigs.id')
      .where('rigs.id', '=', job.rigId)
      .where('member.userId', '=', job.userId)
      .executeTakeFirst();
    if (!user || !user.on || !stillMember) return null;
    const previous = await db
      .selectFrom('email_log')
      .select('meta')
      .where('user_id', '=', job.userId)
      .where('rig_id', '=', job.rigId)
      .where('kind', '=', 'report')
      .where('status', '=', 'sent')
      .where('idempotency_key', '!=', reportKey(job.userId, job.rigId, job.weekKey))
      .orderBy('sent_at', 'desc')
      .executeTakeFirst();
    const lastState = (previous?.meta as { figures?: RigFigures } | null)?.figures?.marginState;
    const f = job.figures;
    const notes = await openAdvisorNotes(deps, job.rigId);
    const chartPng = weekChartPng(f.weekSocPercent, f.cutoffSocPercent, f.chartStartHourOfWeek);
    const change = !lastState ? 'your first weekly report for this rig' : lastState === f.marginState ? `unchanged since last week` : `${STATE_WORD[lastState]} last week`;
    const { html, text } = await renderLetter({
      preview: `${f.rigName}: ${daysText(f.daysParked, f.horizonDays)} parked, margin ${STATE_WORD[f.marginState]}`,
      heading: `${f.rigName}: your week ahead`,
      intro: [`Hello ${user.name}, here is ${f.rigName}'s battery budget for the week of ${job.weekKey}.`],
      sections: [
        {
          rows: [
            ['Days parked', daysText(f.daysParked, f.horizonDays)],
            ['Days on your routine', f.holds ? 'holds (the week balances)' : daysText(f.daysOnRoutine, f.horizonDays)],
            ['Margin', `${STATE_WORD[f.marginState]} (${change})`],
            ['Planned stay', `${f.plannedStayDays} days`],
          ],
        },
        { heading: 'The week ahead', image: { cid: 'week-ahead', alt: `State of charge over the next 7 days; cut-off at ${f.cutoffSocPercent} %` } },
        {
          heading: 'Biggest drains',
          rows: f.drains.map((d) => [d.kind === 'standby' ? `${d.name} (standby)` : d.name, `${d.ahPerDay.toFixed(1)} Ah a day, ${d.sharePercent} %`]),
          lines: [`Standby (inverter idle, key-off draw, self-discharge) is ${f.standbySharePercent} % of what the rig uses.`],
        },
        ...(f.fixes.length
          ? [{ heading: 'Top Fixes', lines: f.fixes.map((x) => `${x.summary} (+${x.daysGainedRoutine.toFixed(1)} days on your routine, +${x.daysGainedParked.toFixed(1)} parked)`), caution: needsWiringCaution(f.fixes) ? FIX_WIRING_CAUTION : undefined }]
          : []),
        ...(notes.length ? [{ heading: 'Open notes from your advisor', lines: notes.map((n) => `${n.author ?? 'Advisor'}: ${n.body.length > 160 ? `${n.body.slice(0, 157)}…` : n.body}`) }] : []),
      ],
      action: { label: 'Open the Outlook', url: `${config.KEYOFF_URL}/rigs/${job.rigId}` },
      footer: footerFor(config, user.id, 'reports'),
    });
    return {
      to: user.email,
      subject: `${f.rigName}: ${daysText(f.daysParked, f.horizonDays)} parked, margin ${STATE_WORD[f.marginState]}`,
      html,
      text,
      chartPng,
      headers: listHeaders(config, user.id, 'reports'),
      meta: { weekKey: job.weekKey, scheduledFor: job.scheduledFor, figures: { ...f, weekSocPercent: undefined } },
    };
  });
}
