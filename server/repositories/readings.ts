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

/** Rows of an upload as columns (times in ms, current positive when drawn). */
export type ReadingColumns = { at: number[]; voltage: number[]; current: (number | null)[]; soc: (number | null)[] };

/** A PostgreSQL array literal of numbers: cheaper to build than the driver's own conversion of a long array. */
const floatArray = (xs: (number | null)[]) => `{${xs.map((x) => (x === null ? 'NULL' : String(x))).join(',')}}`;

/**
 * A log's rows in slices of 5,000, each one statement over arrays (`unnest`), so building the query costs
 * almost nothing; the caller's `afterSlice` gives the event loop back between slices.
 */
export async function insertReadingColumns(db: Exec, rigId: string, uploadId: string, createdBy: string, rested: boolean, cols: ReadingColumns, afterSlice: () => Promise<void>) {
  for (let i = 0; i < cols.at.length; i += 5000) {
    const j = i + 5000;
    await sql`
      insert into readings (rig_id, upload_id, created_by, created_at, at, voltage_v, current_a, soc_percent, rested, place, note)
      select ${rigId}, ${uploadId}, ${createdBy}, now(), to_timestamp(u.t / 1000.0), u.v, u.c, u.s, ${rested}, 'terminals', ''
      from unnest(${floatArray(cols.at.slice(i, j))}::float8[], ${floatArray(cols.voltage.slice(i, j))}::float8[], ${floatArray(cols.current.slice(i, j))}::float8[], ${floatArray(cols.soc.slice(i, j))}::float8[]) as u(t, v, c, s)`.execute(db);
    await afterSlice();
  }
}

/** The rig's row locked for this transaction (two uploads at once cannot both pass the cap), and how many readings it keeps. */
export async function lockAndCountReadings(db: Exec, rigId: string) {
  await db.selectFrom('rigs').select('id').where('id', '=', rigId).forUpdate().executeTakeFirst();
  return Number((await db.selectFrom('readings').select((eb) => eb.fn.countAll().as('n')).where('rig_id', '=', rigId).executeTakeFirstOrThrow()).n);
}

/** How many readings the rig keeps and the time they span. */
export async function readingStats(db: Exec, rigId: string) {
  const row = await db
    .selectFrom('readings')
    .select((eb) => [eb.fn.countAll().as('n'), eb.fn.min('at').as('first'), eb.fn.max('at').as('last')])
    .where('rig_id', '=', rigId)
    .executeTakeFirstOrThrow();
  return { total: Number(row.n), first: row.first ? new Date(row.first as Date) : null, last: row.last ? new Date(row.last as Date) : null };
}

type Window = { from: Date; to: Date; trickleA: number };

/**
 * The chart of a view: the readings averaged into at most `points` buckets of equal width, with the mean
 * voltage, current and monitor state of charge, and the mean voltage of the rested readings (no more than a trickle flowing).
 */
export async function chartBuckets(db: Exec, rigId: string, w: Window & { points: number }) {
  const width = Math.max(1, Math.ceil((w.to.getTime() - w.from.getTime()) / 1000 / w.points));
  const { rows } = await sql<{ t: number; n: number; v: number; c: number | null; s: number | null; vr: number | null }>`
    select avg(extract(epoch from at)) * 1000 as t, count(*)::int as n, avg(voltage_v) as v, avg(current_a) as c, avg(soc_percent) as s,
      avg(voltage_v) filter (where rested and (current_a is null or abs(current_a) <= ${w.trickleA})) as vr
    from readings where rig_id = ${rigId} and at >= ${w.from} and at <= ${w.to}
    group by least(floor(extract(epoch from at - ${w.from}::timestamptz) / ${width}), ${w.points - 1}) order by 1`.execute(db);
  return rows.map((r) => ({ ...r, t: Number(r.t) }));
}

/**
 * The record summed by the hour (UTC, as `summarizeReadings` does) by the rules of `summarizeReadings` (shared/energy/readings.ts):
 * within a series (one log, or the typed readings) each pair of consecutive readings up to `maxGapHours`
 * apart is a segment, counted in the hour it starts; its current is the mean of the currents measured at its
 * ends, and it is quiet unless an end is charging; a monitor's state of charge counts where it falls.
 */
export async function hourlySummary(db: Exec, rigId: string, w: Window & { maxGapHours: number }) {
  const { rows } = await sql<{ hour: Date; current_hours: number; current_ah: number; soc_hours: number; soc_fall: number }>`
    with seg as (
      select at, current_a as c, soc_percent as s, lead(at) over w as at1, lead(current_a) over w as c1, lead(soc_percent) over w as s1
      from readings where rig_id = ${rigId} and at >= ${w.from} and at <= ${w.to}
      window w as (partition by upload_id order by at)
    ), q as (
      select date_trunc('hour', at) as hour, extract(epoch from at1 - at) / 3600 as dt,
        case when (c is not null or c1 is not null) and coalesce(c, 0) >= -${w.trickleA}::float8 and coalesce(c1, 0) >= -${w.trickleA}::float8 then coalesce((c + c1) / 2, c, c1) end as amps,
        case when s1 <= s then s - s1 end as fall
      from seg where at1 is not null
    )
    select hour, coalesce(sum(dt) filter (where amps is not null), 0) as current_hours, coalesce(sum(amps * dt), 0) as current_ah,
      coalesce(sum(dt) filter (where fall is not null), 0) as soc_hours, coalesce(sum(fall), 0) as soc_fall
    from q where dt > 0 and dt <= ${w.maxGapHours} and (amps is not null or fall is not null)
    group by hour order by hour`.execute(db);
  return rows.map((r) => ({ hour: new Date(r.hour).toISOString(), currentHours: Number(r.current_hours), currentAh: Number(r.current_ah), socHours: Number(r.soc_hours), socFallPoints: Number(r.soc_fall) }));
}

/** Runs of consecutive rested readings (no more than a trickle) within a series: first and last voltage; the 1,000 longest. */
export async function restedRuns(db: Exec, rigId: string, w: Window) {
  const { rows } = await sql<{ f: Date; fv: number; t: Date; tv: number }>`
    with r as (
      select at, voltage_v as v, upload_id, rested and (current_a is null or abs(current_a) <= ${w.trickleA}) as ok
      from readings where rig_id = ${rigId} and at >= ${w.from} and at <= ${w.to}
    ), g as (
      select *, row_number() over (partition by upload_id order by at) - row_number() over (partition by upload_id, ok order by at) as grp from r
    ), runs as (
      select distinct on (upload_id, grp)
        first_value(at) over x as f, first_value(v) over x as fv, last_value(at) over x as t, last_value(v) over x as tv, count(*) over x as n
      from g where ok
      window x as (partition by upload_id, grp order by at rows between unbounded preceding and unbounded following)
    )
    select f, fv, t, tv from runs where n >= 2 order by t - f desc limit 1000`.execute(db);
  return rows.map((r) => ({ from: new Date(r.f).toISOString(), to: new Date(r.t).toISOString(), fromV: r.fv, toV: r.tv }));
}

/** How many readings marked rested carried more than a trickle. */
export async function flaggedRestedCount(db: Exec, rigId: string, w: Window) {
  const row = await db
    .selectFrom('readings')
    .select((eb) => eb.fn.countAll().as('n'))
    .where('rig_id', '=', rigId)
    .where('at', '>=', w.from)
    .where('at', '<=', w.to)
    .where('rested', '=', true)
    .where(sql<boolean>`abs(current_a) > ${w.trickleA}`)
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** The first reading in the window whose state of charge is known: a monitor's, or (for the caller to read) a rested voltage. */
export async function firstKnownCharge(db: Exec, rigId: string, w: Window) {
  const { rows } = await sql<{ at: Date; v: number; s: number | null }>`
    (select at, voltage_v as v, soc_percent as s from readings where rig_id = ${rigId} and at >= ${w.from} and at <= ${w.to} and soc_percent is not null order by at limit 1)
    union all
    (select at, voltage_v as v, null as s from readings where rig_id = ${rigId} and at >= ${w.from} and at <= ${w.to} and rested and (current_a is null or abs(current_a) <= ${w.trickleA}) order by at limit 1)`.execute(db);
  return rows.map((r) => ({ at: new Date(r.at), voltageV: r.v, socPercent: r.s }));
}

export async function spotReadings(db: Exec, rigId: string, limit = 200) {
  return db
    .selectFrom('readings')
    .leftJoin('user', 'user.id', 'readings.created_by')
    .select(['readings.id', 'readings.at', 'readings.voltage_v', 'readings.current_a', 'readings.soc_percent', 'readings.rested', 'readings.place', 'readings.note', 'readings.created_by', 'user.name as by'])
    .where('readings.rig_id', '=', rigId)
    .where('readings.upload_id', 'is', null)
    .orderBy('readings.at', 'desc')
    .limit(limit)
    .execute();
}

/** A typed reading of the rig (not a row of a log). */
export async function findSpotReading(db: Exec, rigId: string, readingId: string) {
  return (await db.selectFrom('readings').select(['id', 'at', 'voltage_v', 'current_a', 'created_by']).where('rig_id', '=', rigId).where('id', '=', readingId).where('upload_id', 'is', null).executeTakeFirst()) ?? null;
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
