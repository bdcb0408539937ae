import { sql } from 'kysely';

import { FIX_WIRING_CAUTION, needsWiringCaution } from '@/shared/safety';
import { footerFor, listHeaders } from '../emails/links';
import { renderLetter } from '../emails/render';
import { listHistory } from '../repositories/history';
import { deliver, SendInFlight } from './deliver';
import { daysText, figuresOfRigs, STATE_WORD } from './figures';
import type { Jobs } from './queue';
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
  const rig = await db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', rigId).executeTakeFirst();
  if (!rig) return { state: null, sent: 0 };
  const figures = (await figuresOfRigs(db, [rig])).get(rig.id)!;
  const now = deps.clock.now();
  const transition = await db.transaction().execute(async (trx) => {
    await trx.insertInto('rig_margin').values({ rig_id: rigId, state: 'comfortable', falls: 0, days_parked: null, checked_at: new Date(0) }).onConflict((oc) => oc.column('rig_id').doNothing()).execute();
    const prev = await trx.selectFrom('rig_margin').selectAll().where('rig_id', '=', rigId).forUpdate().executeTakeFirstOrThrow();
    const fell = prev.state === 'comfortable' && figures.marginState !== 'comfortable';
    const falls = prev.falls + (fell ? 1 : 0);
    await trx.updateTable('rig_margin').set({ state: figures.marginState, falls, days_parked: figures.daysParked, checked_at: now }).where('rig_id', '=', rigId).execute();
    return { prev, falls };
  });
  if (figures.marginState === 'comfortable') return { state: figures.marginState, sent: 0 };

  const people = await db
    .selectFrom('member')
    .innerJoin('rigs', 'rigs.household_id', 'member.organizationId')
    .innerJoin('user', 'user.id', 'member.userId')
    .leftJoin('email_prefs', 'email_prefs.user_id', 'member.userId')
    .select(['user.id as id', 'user.name as name', 'user.email as email', sql<string>`coalesce(email_prefs.warn_at, 'tight')`.as('warnAt')])
    .where('rigs.id', '=', rigId)
    .where(sql<boolean>`coalesce(email_prefs.warnings_on, true)`)
    .execute();
  const wanted = people.filter((p) => p.warnAt === 'tight' || figures.marginState === 'short');
  // What changed since the rig was last seen Comfortable (or since the last check).
  const changes = (await listHistory(db, rigId, { since: transition.prev.checked_at as unknown as Date, limit: 5 })).filter((h) => h.kind.startsWith('load') || ['battery', 'inverter', 'charging', 'routine', 'stay'].includes(h.kind));
  let sent = 0;
  for (const person of wanted) {
    // Another check of this rig may be sending this very warning: it is its job then (and its retry's).
    const result = await deliverOnce(deps, { idempotencyKey: warningKey(person.id, rigId, transition.falls), kind: 'warning', userId: person.id, rigId }, async () => {
      const f = figures;
      const what = changes.length
        ? changes.map((c) => `${c.actor_name} ${c.summary}: days parked ${daysText(c.days_parked_before, f.horizonDays)} → ${daysText(c.days_parked_after, f.horizonDays)}.`)
        : ['No one changed the rig since the last check; the projection moved with the routine, the planned stay or the season.'];
      const top = f.fixes[0];
      const { html, text } = await renderLetter({
        preview: `${f.rigName}'s margin is now ${STATE_WORD[f.marginState]}`,
        heading: `${f.rigName}'s margin is ${STATE_WORD[f.marginState]}`,
        intro: [
          `Hello ${person.name}, ${f.rigName} now reaches its cut-off ${f.marginDays === null ? 'after' : f.marginDays < 0 ? `${Math.abs(f.marginDays).toFixed(1)} days before` : `only ${f.marginDays.toFixed(1)} days after`} the end of the planned ${f.plannedStayDays}-day stay.`,
          `Days parked: ${daysText(f.daysParked, f.horizonDays)}. Days on your routine: ${f.holds ? 'holds' : daysText(f.daysOnRoutine, f.horizonDays)}.`,
        ],
        sections: [
          { heading: 'What changed', lines: what },
          ...(top ? [{ heading: 'The top Fix', lines: [`${top.summary} (+${top.daysGainedRoutine.toFixed(1)} days on your routine, +${top.daysGainedParked.toFixed(1)} parked)`], caution: needsWiringCaution([top]) ? FIX_WIRING_CAUTION : undefined }] : []),
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
  const rigs = await deps.db.selectFrom('rigs').select('id').execute();
  for (let i = 0; i < rigs.length; i += 1000) {
    await jobs.boss.insert(rigs.slice(i, i + 1000).map((r) => ({ name: QUEUES.marginCheck, data: { rigId: r.id }, singletonKey: r.id })));
  }
  return rigs.length;
}
