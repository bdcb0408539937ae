import type { Db } from '@/db/client';
import { dropVerdict } from '@/shared/energy/drop-verdict';
import { trickleA, twoFigures, voltageDropTest } from '@/shared/energy/readings';
import { rigPowerSchema } from '@/shared/schemas/projection';
import type { ReadingInputParsed } from '@/shared/schemas/reading';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { deleteReading, deleteUpload, findSpotReading, findUpload, insertReadings, type NewReadingRow } from '../repositories/readings';
import type { Storage } from '../storage';
import { cableRunsOf } from './cable-runs';
import type { Actor } from './history';
import { mayDelete, recordReadingChange } from './readings-shared';
import { rigChanged, type WriteCtx } from './rig-changed';

// The readings service: spot readings, removing a log or a photo, and the drop test. Logs are in
// readings-csv.ts and photos in readings-photos.ts; both are served from here too, for the routes.
export { previewLog, uploadLog } from './readings-csv';
export { photoUrls, uploadPhoto } from './readings-photos';

const when = (d: Date) => d.toISOString().slice(0, 16).replace('T', ' ') + ' UTC';

/**
 * A typed reading. One marked rested with more than a trickle flowing is refused, naming the field: a
 * battery with current flowing is not resting, and its voltage would read as a wrong state of charge.
 */
export async function addSpotReading(ctx: WriteCtx, rig: RigAccess, actor: Actor, r: ReadingInputParsed) {
  const { db } = ctx;
  const power = rigPowerSchema.parse(rig.power);
  const trickle = trickleA(power.battery.capacityAh);
  if (r.rested && r.currentA !== undefined && Math.abs(r.currentA) > trickle) {
    throw new HttpError(400, 'validation_failed', 'A rested battery has no more than a trickle flowing.', [
      { path: 'rested', message: `${r.currentA} A was flowing: a battery is rested only with no more than ${twoFigures(trickle)} A (C/1000) for two hours or more. Save it as not rested.` },
    ]);
  }
  const row: NewReadingRow = { at: new Date(r.at), voltage_v: r.voltageV, current_a: r.currentA ?? null, soc_percent: r.socPercent ?? null, rested: r.rested, place: r.place, note: r.note };
  await insertReadings(db, rig.id, null, actor.id, [row]);
  await recordReadingChange(db, rig, actor, 'reading-added', `added a reading: ${r.voltageV} V${r.currentA !== undefined ? `, ${r.currentA} A` : ''}${r.rested ? ', rested' : ''} at ${when(row.at)}`);
  rigChanged(ctx, rig.id);
}

export async function removeSpotReading(ctx: WriteCtx, rig: RigAccess, actor: Actor, readingId: string) {
  const { db } = ctx;
  const reading = await findSpotReading(db, rig.id, readingId);
  if (!reading) throw new HttpError(404, 'not_found', 'No such reading on this rig (a row of an uploaded log goes with its upload).');
  mayDelete(rig, actor, reading.created_by);
  if (!(await deleteReading(db, rig.id, readingId))) throw new HttpError(404, 'not_found', 'No such reading on this rig.');
  await recordReadingChange(db, rig, actor, 'reading-removed', `deleted a reading: ${reading.voltage_v} V${reading.current_a !== null ? `, ${reading.current_a} A` : ''} at ${when(new Date(reading.at as unknown as Date))}`);
  rigChanged(ctx, rig.id);
}

/** A log (with its rows) or a photo, and its objects in the store; by who added it or the owner. */
export async function removeUpload(ctx: WriteCtx, storage: Storage, rig: RigAccess, actor: Actor, uploadId: string, kind: 'log' | 'photo') {
  const { db } = ctx;
  const upload = await findUpload(db, rig.id, uploadId, kind);
  if (!upload) throw new HttpError(404, 'not_found', kind === 'log' ? 'No such log on this rig.' : 'No such photo on this rig.');
  mayDelete(rig, actor, upload.created_by);
  await deleteUpload(db, upload.id);
  // The rows are gone; an object the store fails to delete now is left for the store's own clean-up, not an error here.
  for (const key of [upload.object_key, upload.thumb_key]) if (key) await storage.remove(key).catch(() => undefined);
  await recordReadingChange(db, rig, actor, 'reading-removed', kind === 'log' ? `deleted the log ${upload.file_name} (${upload.row_count.toLocaleString('en-US')} readings)` : `deleted the photo ${upload.file_name}`);
  rigChanged(ctx, rig.id);
}

/** The drop test on a rig: against a cable run's expected resistance (its conductor at 20 °C plus the return) when one is named. */
export async function dropTestOn(db: Db, rig: RigAccess, input: { batteryV: number; pointV: number; currentA: number; cableRunId?: string }) {
  let expectedOhm: number | null = null;
  let label: string | null = null;
  let allowedPercent: number | null = null;
  if (input.cableRunId) {
    const runs = await cableRunsOf(db, rig);
    const run = runs.find((r) => r.id === input.cableRunId);
    if (!run) throw new HttpError(400, 'validation_failed', 'That cable run is not on this rig.', [{ path: 'cableRunId', message: 'No such cable run on this rig.' }]);
    label = run.label;
    allowedPercent = run.maxDropPercent;
    if (run.sizing && run.currentA > 0) expectedOhm = run.sizing.dropV / run.currentA;
  }
  const test = voltageDropTest({ ...input, expectedOhm });
  return { ...test, cableRun: label, verdict: allowedPercent === null ? null : dropVerdict(test.dropPercent, allowedPercent) };
}
