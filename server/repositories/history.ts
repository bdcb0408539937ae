import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, HistoryKind } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;

export type HistoryEntry = {
  rigId: string;
  actor: { id: string; name: string } | null;
  kind: HistoryKind;
  summary: string;
  daysParkedBefore: number | null;
  daysParkedAfter: number | null;
  undo?: { before: unknown; after: unknown };
};

export async function insertHistory(db: Exec, e: HistoryEntry) {
  await db
    .insertInto('rig_history')
    .values({
      rig_id: e.rigId,
      actor_id: e.actor?.id ?? null,
      actor_name: e.actor?.name ?? 'Keyoff',
      kind: e.kind,
      summary: e.summary,
      days_parked_before: e.daysParkedBefore,
      days_parked_after: e.daysParkedAfter,
      undo: e.undo ? JSON.stringify(e.undo) : null,
      created_at: new Date(),
    })
    .execute();
}

export async function listHistory(db: Exec, rigId: string, opts: { since?: Date; limit?: number } = {}) {
  let q = db.selectFrom('rig_history').selectAll().where('rig_id', '=', rigId);
  if (opts.since) q = q.where('created_at', '>', opts.since);
  return q.orderBy('created_at', 'desc').limit(opts.limit ?? 200).execute();
}

export const findHistoryEntry = (db: Exec, rigId: string, entryId: string) =>
  db.selectFrom('rig_history').selectAll().where('rig_id', '=', rigId).where('id', '=', entryId).executeTakeFirst();

/** Marks a Fix's entry undone; false when it already was (two undos racing). */
export async function markUndone(db: Exec, entryId: string) {
  const r = await db.updateTable('rig_history').set({ undone_at: new Date() }).where('id', '=', entryId).where('undone_at', 'is', null).executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}
