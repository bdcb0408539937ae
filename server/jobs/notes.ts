import { sql } from 'kysely';

import { footerFor, listHeaders } from '../emails/links';
import { renderLetter } from '../emails/render';
import { deliver } from './deliver';
import type { JobDeps } from './types';

/** Who hears of a new note: the other side. An advisor's note goes to the household; the household's to its advisors. */
export async function noteRecipients(deps: Pick<JobDeps, 'db'>, householdId: string, authorId: string) {
  const members = await deps.db.selectFrom('member').select(['userId', 'role']).where('organizationId', '=', householdId).execute();
  const author = members.find((m) => m.userId === authorId);
  const authorIsAdvisor = author?.role === 'advisor';
  return members.filter((m) => m.userId !== authorId && (m.role === 'advisor') !== authorIsAdvisor).map((m) => m.userId);
}

/**
 * One e-mail with every note on the rig the person has not been told of (written by someone else since
 * their last note e-mail). The job waits NOTE_EMAIL_GATHER_SECONDS after the first note, and the queue
 * keeps one waiting job per person and rig, so a burst of notes makes one e-mail.
 */
export async function sendNoteDigest(deps: JobDeps, job: { rigId: string; userId: string }) {
  const { db, config } = deps;
  const user = await db
    .selectFrom('user')
    .leftJoin('email_prefs', 'email_prefs.user_id', 'user.id')
    .select(['user.id', 'user.name', 'user.email', sql<boolean>`coalesce(email_prefs.note_emails_on, true)`.as('on')])
    .where('user.id', '=', job.userId)
    .executeTakeFirst();
  const rig = await db
    .selectFrom('rigs')
    .innerJoin('member', 'member.organizationId', 'rigs.household_id')
    .select(['rigs.id', 'rigs.name'])
    .where('rigs.id', '=', job.rigId)
    .where('member.userId', '=', job.userId)
    .executeTakeFirst();
  if (!user || !user.on || !rig) return 'skipped';
  const last = await db
    .selectFrom('email_log')
    .select(sql<Date | null>`max((meta->>'newestAt')::timestamptz)`.as('newest'))
    .where('user_id', '=', job.userId)
    .where('rig_id', '=', job.rigId)
    .where('kind', '=', 'notes')
    .where('status', '=', 'sent')
    .executeTakeFirst();
  let q = db
    .selectFrom('notes')
    .leftJoin('user', 'user.id', 'notes.author_id')
    .select(['notes.id', 'notes.body', 'notes.parent_id', 'notes.created_at', 'user.name as author'])
    .where('notes.rig_id', '=', job.rigId)
    .where((eb) => eb.or([eb('notes.author_id', '!=', job.userId), eb('notes.author_id', 'is', null)]))
    .orderBy('notes.created_at');
  if (last?.newest) q = q.where('notes.created_at', '>', last.newest);
  const notes = await q.execute();
  if (!notes.length) return 'skipped';
  const newest = notes[notes.length - 1];
  return deliver(deps, { idempotencyKey: `notes:${job.userId}:${job.rigId}:${newest.id}`, kind: 'notes', userId: job.userId, rigId: job.rigId }, async () => {
    const { html, text } = await renderLetter({
      preview: `${notes.length === 1 ? 'A new note' : `${notes.length} new notes`} on ${rig.name}`,
      heading: `${notes.length === 1 ? 'A new note' : `${notes.length} new notes`} on ${rig.name}`,
      intro: [`Hello ${user.name}, here is what was written on ${rig.name}.`],
      sections: notes.map((n) => ({ heading: `${n.author ?? 'Someone'}${n.parent_id ? ' replied' : ''}`, lines: n.body.split('\n') })),
      action: { label: 'Open the Notes', url: `${config.KEYOFF_URL}/rigs/${job.rigId}/notes` },
      footer: footerFor(config, user.id, 'notes'),
    });
    return {
      to: user.email,
      subject: `${notes.length === 1 ? 'A new note' : `${notes.length} new notes`} on ${rig.name}`,
      html,
      text,
      headers: listHeaders(config, user.id, 'notes'),
      meta: { notes: notes.map((n) => n.id), newestAt: new Date(newest.created_at as unknown as Date).toISOString() },
    };
  });
}
