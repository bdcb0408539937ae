import type { Db } from '@/db/client';
import type { CableRunTable } from '@/db/schema';
import type { Insertable } from 'kysely';

type NewRun = Omit<Insertable<CableRunTable>, 'rig_id'>;

export const listCableRuns = (db: Db, rigId: string) => db.selectFrom('cable_runs').selectAll().where('rig_id', '=', rigId).orderBy('created_at').execute();

export const insertCableRun = (db: Db, rigId: string, run: NewRun) => db.insertInto('cable_runs').values({ ...run, rig_id: rigId }).returningAll().executeTakeFirstOrThrow();

export async function updateCableRun(db: Db, rigId: string, runId: string, run: Omit<NewRun, 'created_by'>) {
  return (await db.updateTable('cable_runs').set({ ...run, updated_at: new Date() }).where('id', '=', runId).where('rig_id', '=', rigId).returningAll().executeTakeFirst()) ?? null;
}

export async function deleteCableRun(db: Db, rigId: string, runId: string) {
  return !!(await db.deleteFrom('cable_runs').where('id', '=', runId).where('rig_id', '=', rigId).returning('id').executeTakeFirst());
}
