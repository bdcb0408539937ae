import { type Insertable, sql, type Kysely, type Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database, UploadTable } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;
export type NewReadingRow = { at: Date; voltage_v: number; current_a: number | null; soc_percent: number | null; rested: boolean; place: 'terminals' | 'device' | 'ground'; note: string };

export async function insertReadings(db: Exec, rigId: string, uploadId: string | null, createdBy: string, rows: NewReadingRow[]) {
  // 9 parameters a row: 5,000 rows stay well under PostgreSQL's 65,535 parameters.
  for (let i = 0; i < rows.length; i += 5000) {
    await db
      .insertInto('readings')
      .values(rows.slice(i, i + 5000).map((r) => ({ ...r, rig_id: rigId, upload_id: uploadId, created_by: createdBy, created_at: new Date() })))
      .execute();
  }
}

/** Every reading of the rig as arrays of its model-relevant columns, oldest first. */
export async function allReadings(db: Exec, rigId: string) {
  return db.selectFrom('readings').select(['at', 'voltage_v', 'current_a', 'soc_percent', 'rested']).where('rig_id', '=', rigId).orderBy('at').execute();
}

/** At most `points` readings spread evenly over the rig's whole record, for the chart. */
export async function sampledReadings(db: Exec, rigId: string, points: number) {
  const { rows } = await sql<{ at: Date; voltage_v: number; current_a: number | null; soc_percent: number | null; rested: boolean; upload_id: string | null }>`
    select at, voltage_v, current_a, soc_percent, rested, upload_id from (
      select *, row_number() over (order by at) as rn, count(*) over () as n from readings where rig_id = ${rigId}
    ) t where (rn - 1) % greatest(1, ceil(n::numeric / ${points})::int) = 0 or rn = n order by at`.execute(db);
  return rows;
}

export async function spotReadings(db: Exec, rigId: string, limit = 200) {
  return db
    .selectFrom('readings')
    .leftJoin('user', 'user.id', 'readings.created_by')
    .select(['readings.id', 'readings.at', 'readings.voltage_v', 'readings.current_a', 'readings.soc_percent', 'readings.rested', 'readings.place', 'readings.note', 'user.name as by'])
    .where('readings.rig_id', '=', rigId)
    .where('readings.upload_id', 'is', null)
    .orderBy('readings.at', 'desc')
    .limit(limit)
    .execute();
}

export async function deleteReading(db: Exec, rigId: string, readingId: string) {
  return (await db.deleteFrom('readings').where('rig_id', '=', rigId).where('id', '=', readingId).where('upload_id', 'is', null).returning('id').executeTakeFirst()) ?? null;
}

export async function uploadsOf(db: Exec, rigId: string) {
  return db
    .selectFrom('uploads')
    .leftJoin('user', 'user.id', 'uploads.created_by')
    .selectAll('uploads')
    .select('user.name as by')
    .where('uploads.rig_id', '=', rigId)
    .orderBy('uploads.created_at', 'desc')
    .execute();
}

export async function findUpload(db: Exec, rigId: string, uploadId: string, kind?: 'log' | 'photo') {
  let q = db.selectFrom('uploads').selectAll().where('rig_id', '=', rigId).where('id', '=', uploadId);
  if (kind) q = q.where('kind', '=', kind);
  return (await q.executeTakeFirst()) ?? null;
}

/** A log or photo's row (its object already stored); returns the row's figures. */
export function insertUpload(db: Exec, row: Insertable<UploadTable>) {
  return db.insertInto('uploads').values(row).returning(['id', 'file_name', 'row_count', 'error_count']).executeTakeFirstOrThrow();
}

export async function deleteUpload(db: Exec, uploadId: string) {
  await db.deleteFrom('uploads').where('id', '=', uploadId).execute();
}

/** The column mapping of the rig's last log, offered for the next. */
export async function saveLogMapping(db: Exec, rigId: string, mapping: unknown) {
  await db.updateTable('rigs').set({ log_mapping: JSON.stringify(mapping) }).where('id', '=', rigId).execute();
}

/** The ids and names of a rig's uploads (for what a note can be written on). */
export const uploadNamesOf = (db: Exec, rigId: string) => db.selectFrom('uploads').select(['id', 'kind', 'file_name']).where('rig_id', '=', rigId).execute();

/** Whether a reading or an upload with this id belongs to the rig. */
export async function readingOrUploadOf(db: Exec, rigId: string, id: string): Promise<'reading' | 'upload' | null> {
  if (await db.selectFrom('readings').select('id').where('rig_id', '=', rigId).where('id', '=', id).executeTakeFirst()) return 'reading';
  if (await db.selectFrom('uploads').select('id').where('rig_id', '=', rigId).where('id', '=', id).executeTakeFirst()) return 'upload';
  return null;
}
