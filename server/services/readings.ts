import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import sharp from 'sharp';

import type { Db } from '@/db/client';
import type { HistoryKind } from '@/db/schema';
import { trickleA, twoFigures, voltageDropTest } from '@/shared/energy/readings';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { type ColumnMapping, LOG_LIMITS, type ReadingInputParsed } from '@/shared/schemas/reading';
import { dropVerdict } from '@/shared/energy/drop-verdict';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { insertHistory } from '../repositories/history';
import { deleteReading, deleteUpload, findSpotReading, findUpload, insertReadingColumns, insertReadings, insertUpload, lockAndCountReadings, type NewReadingRow, saveLogMapping } from '../repositories/readings';
import { loadsOfRigs } from '../repositories/rigs';
import type { Storage } from '../storage';
import { cableRunsOf } from './cable-runs';
import { type Actor, daysParkedOf } from './history';
import { parseLog, previewText, requireText } from './log-parse';
import { rigChanged, type WriteCtx } from './rig-changed';
import { loadFromRow } from './rigs-model';

/** A file name safe to show and to put in a header: letters, digits, dot, dash, underscore and spaces. */
export function cleanName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const cleaned = base.normalize('NFKD').replace(/[^\w.\- ]+/g, '').replace(/\s+/g, ' ').replace(/^\.+/, '').trim().slice(0, 100);
  return cleaned || 'file';
}

/** A line in the rig's History: readings do not move the forecast, so Days parked shows no change. */
async function recordReadingChange(ctx: WriteCtx, rig: RigAccess, actor: Actor, kind: HistoryKind, summary: string) {
  const days = daysParkedOf(rigPowerSchema.parse(rig.power), (await loadsOfRigs(ctx.db, [rig.id])).map(loadFromRow));
  await insertHistory(ctx.db, { rigId: rig.id, actor, kind, summary, daysParkedBefore: days, daysParkedAfter: days });
  rigChanged(ctx, rig.id);
}

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
  await recordReadingChange(ctx, rig, actor, 'reading-added', `added a reading: ${r.voltageV} V${r.currentA !== undefined ? `, ${r.currentA} A` : ''}${r.rested ? ', rested' : ''} at ${when(row.at)}`);
}

/** Who added something, or the owner, may delete it. */
function mayDelete(rig: RigAccess, actor: Actor, createdBy: string | null) {
  if (rig.role !== 'owner' && createdBy !== actor.id) throw new HttpError(403, 'forbidden', 'Only the person who added it, or the owner of the rig, can delete it.');
}

export async function removeSpotReading(ctx: WriteCtx, rig: RigAccess, actor: Actor, readingId: string) {
  const { db } = ctx;
  const reading = await findSpotReading(db, rig.id, readingId);
  if (!reading) throw new HttpError(404, 'not_found', 'No such reading on this rig (a row of an uploaded log goes with its upload).');
  mayDelete(rig, actor, reading.created_by);
  if (!(await deleteReading(db, rig.id, readingId))) throw new HttpError(404, 'not_found', 'No such reading on this rig.');
  await recordReadingChange(ctx, rig, actor, 'reading-removed', `deleted a reading: ${reading.voltage_v} V${reading.current_a !== null ? `, ${reading.current_a} A` : ''} at ${when(new Date(reading.at as unknown as Date))}`);
}

/** The header, a few rows and a first guess at the mapping (or the rig's remembered one). */
export async function previewLog(rig: RigAccess, buf: Buffer) {
  const { header, sample, rows, delimiter, decimalComma } = previewText(await requireText(buf));
  const remembered = rig.log_mapping as Partial<ColumnMapping> | null;
  const guess: Partial<ColumnMapping> = {};
  for (const key of Object.keys(GUESS) as (keyof typeof GUESS)[]) {
    const found = header.find((h) => GUESS[key].test(h) && !Object.values(guess).includes(h));
    if (found) guess[key] = found;
  }
  const fits = remembered && remembered.time && remembered.voltage && [remembered.time, remembered.voltage, remembered.current, remembered.soc].every((c) => c === undefined || header.includes(c));
  const mapping = fits ? { ...remembered, decimalComma: remembered.decimalComma ?? decimalComma } : { ...guess, currentSign: 'drawn-positive' as const, decimalComma };
  return { columns: header, sample, rows, delimiter, decimalComma, mapping, remembered: !!fits };
}

const GUESS = { time: /time|date|stamp|zeit|datum/i, voltage: /volt|^v$|\(v\)|spannung/i, current: /curr|amp|^a$|\(a\)|strom/i, soc: /soc|state.*charge|%/i };

/**
 * A CSV log: every row checked (line numbers and reasons for the bad ones), the good rows stored in one
 * transaction with the upload; with allOrNothing, nothing when any row is bad. The rig keeps at most
 * LOG_LIMITS.rigRows readings: a log that would pass it is refused whole. The file goes to object storage
 * first; if the database then fails, the object is removed again.
 */
export async function uploadLog(ctx: WriteCtx, storage: Storage, rig: RigAccess, actor: Actor, file: { buffer: Buffer; originalname: string }, opts: { mapping: ColumnMapping; allOrNothing: boolean; rested: boolean; timeZone: string }) {
  const { db } = ctx;
  const { rows, errors, total } = await parseLog(await requireText(file.buffer), opts.mapping, opts.timeZone);
  const listed = errors.slice(0, 100).map((e) => ({ path: `line ${e.line}`, message: e.reason }));
  if (errors.length && opts.allOrNothing) throw new HttpError(422, 'unprocessable', `${errors.length} of ${total} rows are not valid; nothing was stored (all or nothing).`, listed);
  if (!rows.at.length) throw new HttpError(422, 'unprocessable', 'No row of the file is valid; nothing was stored.', listed);
  // Rows marked rested that carry more than a trickle are kept as not rested (a battery with current flowing is not resting).
  const power = rigPowerSchema.parse(rig.power);
  const trickle = trickleA(power.battery.capacityAh);
  const notRested = opts.rested ? rows.current.filter((c) => c !== null && Math.abs(c) > trickle).length : 0;
  const key = `rigs/${rig.id}/logs/${randomUUID()}.csv`;
  await storage.put(key, file.buffer, 'text/csv');
  try {
    const upload = await db.transaction().execute(async (trx) => {
      const kept = await lockAndCountReadings(trx, rig.id);
      if (kept + rows.at.length > LOG_LIMITS.rigRows) {
        throw new HttpError(413, 'payload_too_large', `This rig keeps at most ${LOG_LIMITS.rigRows.toLocaleString('en-US')} readings; it has ${kept.toLocaleString('en-US')} and this log adds ${rows.at.length.toLocaleString('en-US')}. Delete an older log first.`, [{ path: 'file', message: 'The rig would keep too many readings.' }]);
      }
      const row = await insertUpload(trx, { rig_id: rig.id, kind: 'log', file_name: cleanName(file.originalname), content_type: 'text/csv', size_bytes: file.buffer.length, object_key: key, thumb_key: null, row_count: rows.at.length, error_count: errors.length, errors: JSON.stringify(errors.slice(0, 200)), mapping: JSON.stringify(opts.mapping), created_by: actor.id, created_at: new Date() });
      const restedRows = opts.rested && notRested ? rows : null;
      if (restedRows) {
        // Two passes: the rows with more than a trickle as not rested, the others as rested.
        const pick = (keep: (c: number | null) => boolean) => {
          const ix = rows.current.flatMap((c, i) => (keep(c) ? [i] : []));
          return { at: ix.map((i) => rows.at[i]), voltage: ix.map((i) => rows.voltage[i]), current: ix.map((i) => rows.current[i]), soc: ix.map((i) => rows.soc[i]) };
        };
        await insertReadingColumns(trx, rig.id, row.id, actor.id, true, pick((c) => c === null || Math.abs(c) <= trickle), yieldToLoop);
        await insertReadingColumns(trx, rig.id, row.id, actor.id, false, pick((c) => c !== null && Math.abs(c) > trickle), yieldToLoop);
      } else {
        await insertReadingColumns(trx, rig.id, row.id, actor.id, opts.rested, rows, yieldToLoop);
      }
      await saveLogMapping(trx, rig.id, opts.mapping);
      return row;
    });
    await recordReadingChange(ctx, rig, actor, 'reading-added', `uploaded the log ${upload.file_name} (${upload.row_count.toLocaleString('en-US')} readings)`);
    const notes = notRested ? [`${notRested.toLocaleString('en-US')} rows marked rested carried more than a trickle (over ${twoFigures(trickle)} A) and are kept as not rested.`] : [];
    return { upload: { id: upload.id, fileName: upload.file_name, rowCount: upload.row_count, errorCount: upload.error_count }, errors: errors.slice(0, 100), notes };
  } catch (err) {
    await storage.remove(key).catch(() => undefined);
    throw err;
  }
}

const yieldToLoop = () => new Promise<void>((r) => setImmediate(r));

const PHOTO_TYPES = new Set(['image/jpeg', 'image/png']);

/** An install photo: JPEG or PNG by its bytes (HEIC refused with what to do), metadata stripped, a thumbnail made. */
export async function uploadPhoto(ctx: WriteCtx, storage: Storage, rig: RigAccess, actor: Actor, file: { buffer: Buffer; originalname: string }, caption: string) {
  const { db } = ctx;
  const detected = await fileTypeFromBuffer(file.buffer);
  if (detected && ['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence', 'image/avif'].includes(detected.mime)) {
    throw new HttpError(415, 'unsupported_media_type', 'HEIC photos are not taken yet: export the photo as JPEG (on most phones: share it, or set the camera to "most compatible").', [{ path: 'file', message: 'HEIC is not supported; use JPEG or PNG.' }]);
  }
  if (!detected || !PHOTO_TYPES.has(detected.mime)) {
    throw new HttpError(415, 'unsupported_media_type', `This file is ${detected ? `a ${detected.ext.toUpperCase()}` : 'not an image'}; install photos are JPEG or PNG.`, [{ path: 'file', message: 'Use a JPEG or PNG photo.' }]);
  }
  let cleaned: Buffer;
  let thumb: Buffer;
  try {
    // Turned upright by its EXIF, then written without metadata (no GPS position leaves with the photo).
    cleaned = await sharp(file.buffer).rotate().toBuffer();
    thumb = await sharp(cleaned).resize({ width: 480, height: 480, fit: 'inside', withoutEnlargement: true }).jpeg({ quality: 75 }).toBuffer();
  } catch {
    throw new HttpError(415, 'unsupported_media_type', 'The image could not be read; it may be damaged.', [{ path: 'file', message: 'Unreadable image.' }]);
  }
  const id = randomUUID();
  const ext = detected.mime === 'image/png' ? 'png' : 'jpg';
  const key = `rigs/${rig.id}/photos/${id}.${ext}`;
  const thumbKey = `rigs/${rig.id}/photos/${id}-thumb.jpg`;
  await storage.put(key, cleaned, detected.mime);
  try {
    await storage.put(thumbKey, thumb, 'image/jpeg');
    const row = await insertUpload(db, { id, rig_id: rig.id, kind: 'photo', file_name: cleanName(file.originalname), content_type: detected.mime, size_bytes: cleaned.length, object_key: key, thumb_key: thumbKey, caption, created_by: actor.id, created_at: new Date() });
    await recordReadingChange(ctx, rig, actor, 'reading-added', `added the photo ${row.file_name}${caption ? ` (${caption})` : ''}`);
    return { id: row.id };
  } catch (err) {
    await storage.remove(key).catch(() => undefined);
    await storage.remove(thumbKey).catch(() => undefined);
    throw err;
  }
}

export async function photoUrls(db: Db, storage: Storage, rig: RigAccess, photoId: string) {
  const photo = await findUpload(db, rig.id, photoId, 'photo');
  if (!photo) throw new HttpError(404, 'not_found', 'No such photo on this rig.');
  const full = await storage.signedUrl(photo.object_key, photo.file_name);
  const thumb = photo.thumb_key ? await storage.signedUrl(photo.thumb_key) : full;
  return { id: photo.id, url: full.url, thumbUrl: thumb.url, expiresAt: full.expiresAt, caption: photo.caption, fileName: photo.file_name };
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
  await recordReadingChange(ctx, rig, actor, 'reading-removed', kind === 'log' ? `deleted the log ${upload.file_name} (${upload.row_count.toLocaleString('en-US')} readings)` : `deleted the photo ${upload.file_name}`);
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
