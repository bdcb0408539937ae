import { FIX_WIRING_CAUTION, needsWiringCaution } from '@/shared/safety';
import { type EnergyUnit, energyInText, formatEnergy } from '@/shared/units';
import { weekChartPng } from '../emails/chart';
import { renderLetter } from '../emails/render';
import { footerFor, listHeaders } from '../emails/links';
import { knownEmailKeys, lastSentMeta, markEmailsQueued, recipient, reportSubscribers } from '../repositories/email';
import { openAdvisorThreads } from '../repositories/notes';
import { rigOfMember } from '../repositories/rigs';
import { deliver } from './deliver';
import { daysText, figuresOfRigs, type RigFigures, STATE_WORD, tripLines } from './figures';
import type { Jobs } from './queue';
import { reportDue } from './schedule';
import { type JobDeps, QUEUES } from './types';

export type ReportJob = { userId: string; rigId: string; weekKey: string; scheduledFor: string; figures: RigFigures };
export const reportKey = (userId: string, rigId: string, weekKey: string) => `report:${userId}:${rigId}:${weekKey}`;

/**
 * The schedule: every report whose hour has come (in its person's zone) and that has not been queued
 * yet. Figures are computed once per rig, then the send jobs go to pg-boss in batches. Returns how many.
 */
export async function enqueueDueReports(deps: JobDeps, jobs: Pick<Jobs, 'boss'>, at: Date): Promise<number> {
  const due = (await reportSubscribers(deps.db)).flatMap((s) => {
    const d = reportDue(at, { timeZone: s.timeZone, weekday: s.weekday, hour: s.hour });
    return d ? [{ ...s, weekKey: d.weekKey, scheduledFor: d.instant.toISOString(), key: reportKey(s.userId, s.rigId, d.weekKey) }] : [];
  });
  if (!due.length) return 0;
  const known = await knownEmailKeys(deps.db, due.map((d) => d.key));
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
    await markEmailsQueued(deps.db, chunk.map((d) => ({ idempotencyKey: d.key, kind: 'report' as const, userId: d.userId, rigId: d.rigId })));
  }
  deps.logger.info({ at: at.toISOString(), queued: fresh.length }, 'weekly reports queued');
  return fresh.length;
}

export async function sendReport(deps: JobDeps, job: ReportJob) {
  const { db, config } = deps;
  return deliver(deps, { idempotencyKey: reportKey(job.userId, job.rigId, job.weekKey), kind: 'report', userId: job.userId, rigId: job.rigId }, async () => {
    const user = await recipient(db, job.userId, 'reports');
    const stillMember = await rigOfMember(db, job.rigId, job.userId);
    if (!user || !user.on || !stillMember) return null;
    const previousMeta = await lastSentMeta(db, job.userId, job.rigId, 'report', reportKey(job.userId, job.rigId, job.weekKey));
    const lastState = (previousMeta as { figures?: RigFigures } | null)?.figures?.marginState;
    const notes = await openAdvisorThreads(db, job.rigId);
    const chartPng = weekChartPng(job.figures.weekSocPercent, job.figures.cutoffSocPercent, job.figures.chartStartHourOfWeek);
    const { html, text, subject } = await reportLetter(config, user, job, lastState, notes);
    return {
      to: user.email,
      subject,
      html,
      text,
      chartPng,
      headers: listHeaders(config, user.id, 'reports'),
      meta: { weekKey: job.weekKey, scheduledFor: job.scheduledFor, figures: { ...job.figures, weekSocPercent: undefined } },
    };
  });
}

/**
 * The weekly report's letter for one person: what sendReport mails, and what the Reports screen previews
 * before the first one goes out. The chart is the image `cid:week-ahead`. Energy is in the person's unit
 * (Wh at the rig's nominal voltage); the advisor's notes are quoted as written.
 */
export async function reportLetter(
  config: JobDeps['config'],
  user: { id: string; name: string; energy: EnergyUnit },
  job: Pick<ReportJob, 'rigId' | 'weekKey' | 'figures'>,
  lastState: RigFigures['marginState'] | undefined,
  notes: { author: string | null; body: string }[],
) {
  const f = job.figures;
  const { amount, inText } = energyFor(user.energy, f);
  const change = !lastState ? 'your first weekly report for this rig' : lastState === f.marginState ? `unchanged since last week` : `${STATE_WORD[lastState]} last week`;
  const letter = await renderLetter({
    preview: `${f.rigName}: ${daysText(f.daysParked, f.horizonDays)} parked, margin ${STATE_WORD[f.marginState]}`,
    heading: `${f.rigName}: your week ahead`,
    intro: [`Hello ${user.name}, here is ${f.rigName}'s battery budget for the week of ${job.weekKey}.`],
    sections: [
      {
        rows: [
          ['Days parked', daysText(f.daysParked, f.horizonDays)],
          ['Days on your routine', f.holds ? 'holds (the week balances)' : daysText(f.daysOnRoutine, f.horizonDays)],
          ['Margin', `${STATE_WORD[f.marginState]} (${change})`],
          f.trip ? ['Trip', `${f.trip.name}: ${f.trip.stays.length} ${f.trip.stays.length === 1 ? 'stay' : 'stays'}`] : ['Planned stay', `${f.plannedStayDays} days`],
        ],
      },
      ...(f.trip ? [{ heading: `Your trip: ${f.trip.name}`, lines: tripLines(f.trip) }] : []),
      { heading: 'The week ahead', image: { cid: 'week-ahead', alt: `State of charge over the next 7 days; cut-off at ${f.cutoffSocPercent} %` } },
      {
        heading: 'Biggest drains',
        rows: f.drains.map((d) => [d.kind === 'standby' ? `${d.name} (standby)` : d.name, `${amount(d.ahPerDay)} a day, ${d.sharePercent} %`]),
        lines: [`Standby (inverter idle, key-off draw, self-discharge) is ${f.standbySharePercent} % of what the rig uses.`],
      },
      ...(f.fixes.length
        ? [{ heading: 'Top Fixes', lines: f.fixes.map((x) => inText(`${x.summary} (${x.gain})`)), caution: needsWiringCaution(f.fixes) ? FIX_WIRING_CAUTION : undefined }]
        : []),
      ...(notes.length ? [{ heading: 'Open notes from your advisor', lines: notes.map((n) => `${n.author ?? 'Advisor'}: ${n.body.length > 160 ? `${n.body.slice(0, 157)}…` : n.body}`) }] : []),
    ],
    action: { label: 'Open the Outlook', url: `${config.KEYOFF_URL}/rigs/${job.rigId}` },
    footer: footerFor(config, user.id, 'reports'),
  });
  return { ...letter, subject: `${f.rigName}: ${daysText(f.daysParked, f.horizonDays)} parked, margin ${STATE_WORD[f.marginState]}` };
}

/**
 * How a letter states energy for its reader: amounts and the model's texts in their unit at the rig's
 * nominal voltage (shared/units.ts). A job queued before the figures carried the voltage stays in Ah.
 */
export function energyFor(energy: EnergyUnit, f: Pick<RigFigures, 'systemVoltage'>) {
  const unit: EnergyUnit = f.systemVoltage ? energy : 'Ah';
  return { amount: (ah: number) => formatEnergy(ah, unit, f.systemVoltage), inText: (text: string) => energyInText(text, unit, f.systemVoltage) };
}
