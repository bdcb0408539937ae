import { FIX_WIRING_CAUTION, needsWiringCaution } from '@/shared/safety';
import { footerFor, listHeaders } from '../emails/links';
import { renderLetter } from '../emails/render';
import { warningRecipients } from '../repositories/email';
import { listHistory } from '../repositories/history';
import { lockMargin, saveMargin } from '../repositories/margin';
import { allRigIds, findRigForModel } from '../repositories/rigs';
import { deliver, SendInFlight } from './deliver';
import { daysText, figuresOfRigs, STATE_WORD, tripLines } from './figures';
import type { Jobs } from './queue';
import { energyFor } from './reports';
import { type JobDeps, QUEUES } from './types';

export const warningKey = (userId: string, rigId: string, fall: number) => `warning:${userId}:${rigId}:${fall}`;

/**
 * Follows a rig's margin state. Each fall from Comfortable to Tight or Short counts one "fall"; every
 * person with warnings on gets one e-mail per fall (Short only, for those who chose that threshold),
 * and nothing more until the rig recovers to Comfortable and falls again. The row lock makes two
 * checks of one rig take turns.
 */
export async function checkMargin(deps: JobDeps, rigId: string) {
  const { db } = deps;
  const rig = await findRigForModel(db, rigId);
  if (!rig) return { state: null, sent: 0 };
  const figures = (await figuresOfRigs(db, [rig])).get(rig.id)!;
  const now = deps.clock.now();
  const transition = await db.transaction().execute(async (trx) => {
    const prev = await lockMargin(trx, rigId);
    const fell = prev.state === 'comfortable' && figures.marginState !== 'comfortable';
    const falls = prev.falls + (fell ? 1 : 0);
    // Every check of one fall (one running beside it, a retry) tells of the changes since the rig was last Comfortable.
    const comfortableAt = (prev.state === 'comfortable' ? prev.checked_at : prev.comfortable_at) as unknown as Date | null;
    await saveMargin(trx, rigId, { state: figures.marginState, falls, daysParked: figures.daysParked, checkedAt: now, comfortableAt: figures.marginState === 'comfortable' ? now : comfortableAt });
    return { prev, falls, comfortableAt };
  });
  if (figures.marginState === 'comfortable') return { state: figures.marginState, sent: 0 };

  const people = await warningRecipients(db, rigId);
  const wanted = people.filter((p) => p.warnAt === 'tight' || figures.marginState === 'short');
  // What changed since the rig was last seen Comfortable (everything, for a rig never seen so).
  const changes = (await listHistory(db, rigId, { since: transition.comfortableAt ?? new Date(0), limit: 5 })).filter((h) => h.kind.startsWith('load') || ['battery', 'inverter', 'charging', 'routine', 'stay'].includes(h.kind));
  let sent = 0;
  for (const person of wanted) {
    // Another check of this rig may be sending this very warning: it is its job then (and its retry's).
    const result = await deliverOnce(deps, { idempotencyKey: warningKey(person.id, rigId, transition.falls), kind: 'warning', userId: person.id, rigId }, async () => {
      const f = figures;
      const { inText } = energyFor(person.energy, f);
      const what = changes.length
        ? changes.map((c) => `${c.actor_name} ${inText(c.summary)}: days parked ${daysText(c.days_parked_before, f.horizonDays)} → ${daysText(c.days_parked_after, f.horizonDays)}.`)
        : ['No one changed the rig since the last check; the projection moved with the routine, the planned stay or the season.'];
      const top = f.fixes[0];
      const { html, text } = await renderLetter({
        preview: `${f.rigName}'s margin is now ${STATE_WORD[f.marginState]}`,
        heading: `${f.rigName}'s margin is ${STATE_WORD[f.marginState]}`,
        intro: [
          f.trip
            ? `Hello ${person.name}, on the trip “${f.trip.name}” ${f.rigName}'s tightest stay now ends ${STATE_WORD[f.marginState]}.`
            : `Hello ${person.name}, ${f.rigName} now reaches its cut-off ${f.marginDays === null ? 'after' : f.marginDays < 0 ? `${Math.abs(f.marginDays).toFixed(1)} days before` : `only ${f.marginDays.toFixed(1)} days after`} the end of the planned ${f.plannedStayDays}-day stay.`,
          `Days parked: ${daysText(f.daysParked, f.horizonDays)}. Days on your routine: ${f.holds ? 'holds' : daysText(f.daysOnRoutine, f.horizonDays)}.`,
        ],
        sections: [
          ...(f.trip ? [{ heading: `The trip: ${f.trip.name}`, lines: tripLines(f.trip) }] : []),
          { heading: 'What changed', lines: what },
          ...(top ? [{ heading: 'The top Fix', lines: [inText(`${top.summary} (${top.gain})`)], caution: needsWiringCaution([top]) ? FIX_WIRING_CAUTION : undefined }] : []),
        ],
        action: { label: 'See the Fixes', url: `${deps.config.KEYOFF_URL}/rigs/${rigId}` },
        footer: footerFor(deps.config, person.id, 'warnings'),
      });
      return {
        to: person.email,
        subject: `${f.rigName}: margin ${STATE_WORD[f.marginState]}, ${daysText(f.daysParked, f.horizonDays)} parked`,
        html,
        text,
        headers: listHeaders(deps.config, person.id, 'warnings'),
        meta: { fall: transition.falls, from: transition.prev.state, figures: { ...f, weekSocPercent: undefined } },
      };
    });
    if (result === 'sent') sent += 1;
  }
  return { state: figures.marginState, sent };
}

async function deliverOnce(...args: Parameters<typeof deliver>) {
  try {
    return await deliver(...args);
  } catch (err) {
    if (err instanceof SendInFlight) return 'skipped' as const;
    throw err;
  }
}

/** The daily pass: one margin check per rig (the short queue drops a rig already waiting). */
export async function queueDailyMarginChecks(deps: JobDeps, jobs: Pick<Jobs, 'boss'>) {
  const rigs = await allRigIds(deps.db);
  for (let i = 0; i < rigs.length; i += 1000) {
    await jobs.boss.insert(rigs.slice(i, i + 1000).map((r) => ({ name: QUEUES.marginCheck, data: { rigId: r.id }, singletonKey: r.id })));
  }
  return rigs.length;
}
