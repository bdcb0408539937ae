import { footerFor, listHeaders } from '../emails/links';
import { renderLetter } from '../emails/render';
import { newestNoteEmailed, recipient } from '../repositories/email';
import { notesForDigest } from '../repositories/notes';
import { rigOfMember } from '../repositories/rigs';
import { deliver } from './deliver';
import type { JobDeps } from './types';

/**
 * One e-mail with every note on the rig the person has not been told of (written by someone else since
 * their last note e-mail). The job waits NOTE_EMAIL_GATHER_SECONDS after the first note, and the queue
 * keeps one waiting job per person and rig, so a burst of notes makes one e-mail.
 */
export async function sendNoteDigest(deps: JobDeps, job: { rigId: string; userId: string }) {
  const { db, config } = deps;
  const user = await recipient(db, job.userId, 'notes');
  const rig = await rigOfMember(db, job.rigId, job.userId);
  if (!user || !user.on || !rig) return 'skipped';
  const notes = await notesForDigest(db, job.rigId, job.userId, await newestNoteEmailed(db, job.userId, job.rigId));
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
