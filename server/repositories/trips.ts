import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;
type TripValues = { name: string; start_date: string; active: boolean; plan: string };

export const listTrips = (db: Exec, rigId: string) =>
  db.selectFrom('trips').selectAll().where('rig_id', '=', rigId).orderBy('start_date', 'desc').orderBy('created_at', 'desc').limit(200).execute();

export const findTrip = (db: Exec, rigId: string, tripId: string) =>
  db.selectFrom('trips').selectAll().where('id', '=', tripId).where('rig_id', '=', rigId).executeTakeFirst();

export const activeTripsOf = (db: Exec, rigIds: string[]) =>
  rigIds.length ? db.selectFrom('trips').selectAll().where('rig_id', 'in', rigIds).where('active', '=', true).execute() : Promise.resolve([]);

/** Only one trip of a rig is active: making one active sets the others aside first. */
export async function clearActive(db: Exec, rigId: string, exceptId?: string) {
  let q = db.updateTable('trips').set({ active: false }).where('rig_id', '=', rigId).where('active', '=', true);
  if (exceptId) q = q.where('id', '!=', exceptId);
  await q.execute();
}

export const insertTrip = (db: Exec, rigId: string, createdBy: string, values: TripValues) =>
  db.insertInto('trips').values({ ...values, rig_id: rigId, created_by: createdBy }).returningAll().executeTakeFirstOrThrow();

export const updateTrip = (db: Exec, rigId: string, tripId: string, values: TripValues) =>
  db.updateTable('trips').set({ ...values, updated_at: new Date() }).where('id', '=', tripId).where('rig_id', '=', rigId).returningAll().executeTakeFirst();

export async function deleteTrip(db: Exec, rigId: string, tripId: string) {
  return !!(await db.deleteFrom('trips').where('id', '=', tripId).where('rig_id', '=', rigId).returning('id').executeTakeFirst());
}
