import type { Db } from '@/db/client';
import { can } from '@/shared/permissions';
import type { NoteCreateInput } from '@/shared/schemas/note';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { listCableRuns } from '../repositories/cable-runs';
import { deleteNote, findNote, insertNote, listNotes, markRead, setNoteBody, setResolved, unreadCount } from '../repositories/notes';
import { loadsOfRigs, membersOf } from '../repositories/rigs';
import type { WriteCtx } from './rig-changed';
import { readingOrUploadOf, uploadNamesOf } from '../repositories/readings';

type LoadSnapshot = { name: string; watts: number | null; amps: number | null; hours_per_day: number; duty_percent: number };

const describeLoad = (l: LoadSnapshot) => `${l.name} was ${l.watts !== null ? `${l.watts} W` : `${l.amps} A`}, ${l.hours_per_day} h a day at ${l.duty_percent} %`;

/** A rig's notes as threads, each reply under its root, with what changed since a note about a load was written. */
export async function notesOf(db: Db, rig: RigAccess, userId: string) {
  const [rows, loads, unread, runs, uploads] = await Promise.all([
    listNotes(db, rig.id),
    loadsOfRigs(db, [rig.id]),
    unreadCount(db, userId, rig.id),
    listCableRuns(db, rig.id),
    uploadNamesOf(db, rig.id),
  ]);
  const otherName = (kind: string, id: string | null) => {
    if (kind === 'cable-run') return runs.find((r) => r.id === id)?.label ?? null;
    if (kind === 'reading') {
      const u = uploads.find((x) => x.id === id);
      return u ? `${u.kind === 'photo' ? 'photo' : 'log'} ${u.file_name}` : 'a reading';
    }
    return null;
  };
  const view = (n: (typeof rows)[number]) => {
    const snap = n.target_snapshot as LoadSnapshot | null;
    const load = n.target_kind === 'load' ? loads.find((l) => l.id === n.target_id) : undefined;
    const changed =
      snap && n.target_kind === 'load'
        ? !load
          ? `written when ${describeLoad(snap)}; that load has been removed`
          : load.watts !== snap.watts || load.amps !== snap.amps || load.hours_per_day !== snap.hours_per_day || load.duty_percent !== snap.duty_percent
            ? `written when ${describeLoad(snap)}`
            : null
        : null;
    return {
      id: n.id,
      parentId: n.parent_id,
      targetKind: n.target_kind,
      targetId: n.target_id,
      targetName: n.target_kind === 'load' ? (load?.name ?? snap?.name ?? null) : otherName(n.target_kind, n.target_id),
      author: n.author_id ? { id: n.author_id, name: n.author_name ?? '' } : null,
      body: n.body,
      rigVersion: n.rig_version,
      writtenWhen: changed,
      resolved: n.resolved_at !== null,
      edited: n.edited_at !== null,
      createdAt: new Date(n.created_at as unknown as Date).toISOString(),
      mine: n.author_id === userId,
    };
  };
  const all = rows.map(view);
  const threads = all.filter((n) => !n.parentId).map((root) => ({ ...root, replies: all.filter((r) => r.parentId === root.id) }));
  return { threads, unread };
}

/** Who hears of a new note: the other side. An advisor's note goes to the household; the household's to its advisors. */
export async function noteRecipients(db: Db, householdId: string, authorId: string) {
  const members = await membersOf(db, householdId);
  const author = members.find((m) => m.userId === authorId);
  const authorIsAdvisor = author?.role === 'advisor';
  return members.filter((m) => m.userId !== authorId && (m.role === 'advisor') !== authorIsAdvisor).map((m) => m.userId);
}

/** Saves a note (or a reply) and tells the other side (an e-mail gathered over a few minutes). Notes move no forecast: no margin check. */
export async function addNote({ db, jobs }: WriteCtx, rig: RigAccess, userId: string, input: NoteCreateInput) {
  let targetKind = input.targetKind;
  let targetId = input.targetId ?? null;
  if (input.parentId) {
    const parent = await findNote(db, rig.id, input.parentId);
    if (!parent || parent.parent_id) throw new HttpError(400, 'validation_failed', 'Reply to a thread on this rig.', [{ path: 'parentId', message: 'No such thread on this rig.' }]);
    targetKind = parent.target_kind;
    targetId = parent.target_id;
  }
  let snapshot: string | null = null;
  if (targetKind === 'load') {
    const load = (await loadsOfRigs(db, [rig.id])).find((l) => l.id === targetId);
    if (!load) throw new HttpError(400, 'validation_failed', 'That load is not on this rig.', [{ path: 'targetId', message: 'No such load on this rig.' }]);
    snapshot = JSON.stringify({ name: load.name, watts: load.watts, amps: load.amps, hours_per_day: load.hours_per_day, duty_percent: load.duty_percent });
  } else if (targetKind === 'cable-run') {
    if (!(await listCableRuns(db, rig.id)).some((r) => r.id === targetId)) throw new HttpError(400, 'validation_failed', 'That cable run is not on this rig.', [{ path: 'targetId', message: 'No such cable run on this rig.' }]);
  } else if (targetKind === 'reading') {
    // A spot reading, or an uploaded log or photo of this rig.
    if (!(await readingOrUploadOf(db, rig.id, targetId!))) throw new HttpError(400, 'validation_failed', 'That reading is not on this rig.', [{ path: 'targetId', message: 'No such reading, log or photo on this rig.' }]);
  }
  const row = await insertNote(db, { rig_id: rig.id, parent_id: input.parentId ?? null, target_kind: targetKind, target_id: targetId, author_id: userId, body: input.body, rig_version: rig.version, target_snapshot: snapshot });
  await markRead(db, userId, rig.id);
  await jobs.noteWritten(rig.id, await noteRecipients(db, rig.household_id, userId));
  return row.id;
}

async function own(db: Db, rig: RigAccess, noteId: string, userId: string, allowOwner: boolean) {
  const note = await findNote(db, rig.id, noteId);
  if (!note) throw new HttpError(404, 'not_found', 'No such note on this rig.');
  if (note.author_id !== userId && !(allowOwner && can(rig.role, { rig: ['delete'] }))) throw new HttpError(403, 'forbidden', 'You can change only your own notes.');
  return note;
}

export async function editNote(db: Db, rig: RigAccess, noteId: string, userId: string, body: string) {
  await own(db, rig, noteId, userId, false);
  await setNoteBody(db, noteId, body);
}

export async function removeNote(db: Db, rig: RigAccess, noteId: string, userId: string) {
  await own(db, rig, noteId, userId, true);
  await deleteNote(db, noteId);
}

export async function resolveThread(db: Db, rig: RigAccess, noteId: string, resolved: boolean) {
  const note = await findNote(db, rig.id, noteId);
  if (!note) throw new HttpError(404, 'not_found', 'No such note on this rig.');
  if (note.parent_id) throw new HttpError(400, 'validation_failed', 'Resolve the thread, not a reply.', [{ path: 'noteId', message: 'This is a reply.' }]);
  await setResolved(db, noteId, resolved);
}

export const readNotes = (db: Db, rig: RigAccess, userId: string) => markRead(db, userId, rig.id);
