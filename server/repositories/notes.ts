import type { NoteTargetKind } from '@/shared/api/notes';
import type { Db } from '@/db/client';

export const listNotes = (db: Db, rigId: string) =>
  db
    .selectFrom('notes')
    .leftJoin('user', 'user.id', 'notes.author_id')
    .selectAll('notes')
    .select(['user.name as author_name'])
    .where('notes.rig_id', '=', rigId)
    .orderBy('notes.created_at')
    .execute();

export const findNote = async (db: Db, rigId: string, noteId: string) =>
  (await db.selectFrom('notes').selectAll().where('rig_id', '=', rigId).where('id', '=', noteId).executeTakeFirst()) ?? null;

export const insertNote = (db: Db, note: { rig_id: string; parent_id: string | null; target_kind: NoteTargetKind; target_id: string | null; author_id: string; body: string; rig_version: number; target_snapshot: string | null }) =>
  db.insertInto('notes').values(note).returningAll().executeTakeFirstOrThrow();

export const setNoteBody = (db: Db, noteId: string, body: string) => db.updateTable('notes').set({ body, edited_at: new Date() }).where('id', '=', noteId).execute();

export const setResolved = (db: Db, noteId: string, resolved: boolean) => db.updateTable('notes').set({ resolved_at: resolved ? new Date() : null }).where('id', '=', noteId).execute();

export const deleteNote = (db: Db, noteId: string) => db.deleteFrom('notes').where('id', '=', noteId).execute();

export async function lastRead(db: Db, userId: string, rigId: string): Promise<Date | null> {
  const row = await db.selectFrom('note_reads').select('read_at').where('user_id', '=', userId).where('rig_id', '=', rigId).executeTakeFirst();
  return row?.read_at ?? null;
}

export const markRead = (db: Db, userId: string, rigId: string) =>
  db
    .insertInto('note_reads')
    .values({ user_id: userId, rig_id: rigId, read_at: new Date() })
    .onConflict((oc) => oc.columns(['user_id', 'rig_id']).doUpdateSet({ read_at: new Date() }))
    .execute();

/** Notes by others written after the person last read the rig's notes. */
export async function unreadCount(db: Db, userId: string, rigId: string): Promise<number> {
  const since = await lastRead(db, userId, rigId);
  let q = db
    .selectFrom('notes')
    .select((eb) => eb.fn.countAll<string>().as('n'))
    .where('rig_id', '=', rigId)
    .where((eb) => eb.or([eb('author_id', '!=', userId), eb('author_id', 'is', null)]));
  if (since) q = q.where('created_at', '>', since);
  return Number((await q.executeTakeFirst())?.n ?? 0);
}

/** Notes on a rig by others than the person, oldest first, after a moment when given (for the note e-mail). */
export function notesForDigest(db: Db, rigId: string, userId: string, after: Date | null) {
  let q = db
    .selectFrom('notes')
    .leftJoin('user', 'user.id', 'notes.author_id')
    .select(['notes.id', 'notes.body', 'notes.parent_id', 'notes.created_at', 'user.name as author'])
    .where('notes.rig_id', '=', rigId)
    .where((eb) => eb.or([eb('notes.author_id', '!=', userId), eb('notes.author_id', 'is', null)]))
    .orderBy('notes.created_at');
  if (after) q = q.where('notes.created_at', '>', after);
  return q.execute();
}

/** Open threads an advisor of the household started on the rig, newest first (at most 3). */
export function openAdvisorThreads(db: Db, rigId: string) {
  return db
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
