import { randomUUID } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import Papa from 'papaparse';
import sharp from 'sharp';

import type { Db } from '@/db/client';
import { project } from '@/shared/energy/project';
import { analyzeReadings, compareStandby, voltageDropTest } from '@/shared/energy/readings';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { type ColumnMapping, LOG_LIMITS, type ReadingInputParsed } from '@/shared/schemas/reading';
import { dropVerdict } from '@/shared/energy/drop-verdict';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { allReadings, deleteReading, deleteUpload, findUpload, insertReadings, insertUpload, type NewReadingRow, sampledReadings, saveLogMapping, spotReadings, uploadsOf } from '../repositories/readings';
import { loadsOfRigs } from '../repositories/rigs';
import type { Storage } from '../storage';
import { cableRunsOf } from './cable-runs';
import { loadFromRow, modelInput } from './rigs-model';

/** A file name safe to show and to put in a header: letters, digits, dot, dash, underscore and spaces. */
export function cleanName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? 'file';
  const cleaned = base.normalize('NFKD').replace(/[^\w.\- ]+/g, '').replace(/\s+/g, ' ').replace(/^\.+/, '').trim().slice(0, 100);
  return cleaned || 'file';
}

export async function addSpotReading(db: Db, rig: RigAccess, userId: string, r: ReadingInputParsed) {
  const row: NewReadingRow = { at: new Date(r.at), voltage_v: r.voltageV, current_a: r.currentA ?? null, soc_percent: r.socPercent ?? null, rested: r.rested, place: r.place, note: r.note };
  await insertReadings(db, rig.id, null, userId, [row]);
}

export async function removeSpotReading(db: Db, rig: RigAccess, readingId: string) {
  if (!(await deleteReading(db, rig.id, readingId))) throw new HttpError(404, 'not_found', 'No such reading on this rig (a row of an uploaded log goes with its upload).');
}

type RowError = { line: number; reason: string };

/** A time from a log: ISO 8601 with its offset, "YYYY-MM-DD HH:MM[:SS]" (taken as UTC), or Unix seconds. */
export function parseLogTime(raw: string): Date | null {
  const v = raw.trim();
  if (/^\d{9,11}$/.test(v)) return new Date(Number(v) * 1000);
  const local = v.match(/^(\d{4}-\d{2}-\d{2})[ T](\d{2}:\d{2})(:\d{2}(?:\.\d+)?)?$/);
  const d = local ? new Date(`${local[1]}T${local[2]}${local[3] ?? ':00'}Z`) : /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/.test(v) ? new Date(v) : null;
  return d && !Number.isNaN(d.getTime()) ? d : null;
}

const numberCell = (raw: string | undefined) => {
  if (raw === undefined || raw.trim() === '') return undefined;
  const n = Number(raw.trim());
  return Number.isFinite(n) ? n : NaN;
};

/** The bytes must be text: no other file type detected, no NUL bytes, valid UTF-8. */
async function requireText(buf: Buffer) {
  const detected = await fileTypeFromBuffer(buf);
  if (detected) throw new HttpError(415, 'unsupported_media_type', `This file is a ${detected.ext.toUpperCase()} (${detected.mime}), not a CSV log. Export the log as CSV text.`, [{ path: 'file', message: 'Not a CSV file.' }]);
  if (buf.includes(0)) throw new HttpError(415, 'unsupported_media_type', 'This file is not text; a CSV log is plain text with one reading a line.', [{ path: 'file', message: 'Not a CSV file.' }]);
  const text = new TextDecoder('utf-8', { fatal: false }).decode(buf);
  if (text.includes('\uFFFD')) throw new HttpError(415, 'unsupported_media_type', 'This file is not UTF-8 text; save the log as CSV (UTF-8).', [{ path: 'file', message: 'Not UTF-8 text.' }]);
  return text.replace(/^\uFEFF/, '');
}

function parseCsv(text: string) {
  if (!text.trim()) throw new HttpError(400, 'validation_failed', 'The file is empty.', [{ path: 'file', message: 'The file is empty.' }]);
  const parsed = Papa.parse<string[]>(text, { header: false, skipEmptyLines: false, delimiter: '' });
  const lines = parsed.data;
  const header = (lines[0] ?? []).map((h) => h.trim());
  const body = lines.slice(1).map((cells, i) => ({ line: i + 2, cells })).filter((r) => r.cells.some((c) => c.trim() !== ''));
  if (!body.length) throw new HttpError(400, 'validation_failed', 'The file has a header row but no readings.', [{ path: 'file', message: 'No rows under the header.' }]);
  if (body.length > LOG_LIMITS.rows) throw new HttpError(413, 'payload_too_large', `The log has ${body.length.toLocaleString('en-US')} rows; at most ${LOG_LIMITS.rows.toLocaleString('en-US')} in one upload.`, [{ path: 'file', message: 'Too many rows.' }]);
  return { header, body };
}

const GUESS: Record<keyof ColumnMapping, RegExp> = { time: /time|date|stamp/i, voltage: /volt|^v$|\(v\)/i, current: /curr|amp|^a$|\(a\)/i, soc: /soc|state.*charge|%/i };

/** The header, a few rows and a first guess at the mapping (or the rig's remembered one). */
export async function previewLog(db: Db, rig: RigAccess, buf: Buffer) {
  const { header, body } = parseCsv(await requireText(buf));
  const remembered = rig.log_mapping as ColumnMapping | null;
  const guess: Partial<ColumnMapping> = {};
  for (const key of Object.keys(GUESS) as (keyof ColumnMapping)[]) {
    const found = header.find((h) => GUESS[key].test(h) && !Object.values(guess).includes(h));
    if (found) guess[key] = found;
  }
  const fits = remembered && [remembered.time, remembered.voltage, remembered.current, remembered.soc].every((c) => c === undefined || header.includes(c));
  return { columns: header, sample: body.slice(0, 5).map((r) => r.cells), rows: body.length, mapping: fits ? remembered : guess, remembered: !!fits };
}

/**
 * A CSV log: every row checked (line numbers and reasons for the bad ones), the good rows stored in one
 * transaction with the upload; with allOrNothing, nothing when any row is bad. The file goes to object
 * storage first; if the database then fails, the object is removed again.
 */
export async function uploadLog(db: Db, storage: Storage, rig: RigAccess, userId: string, file: { buffer: Buffer; originalname: string }, opts: { mapping: ColumnMapping; allOrNothing: boolean; rested: boolean }) {
  const { header, body } = parseCsv(await requireText(file.buffer));
  const col = (name: string | undefined, field: keyof ColumnMapping) => {
    if (name === undefined) return -1;
    const i = header.indexOf(name);
    if (i < 0) throw new HttpError(400, 'validation_failed', `No column named "${name}" in the file; its columns are: ${header.join(', ')}.`, [{ path: `mapping.${field}`, message: `No column "${name}".` }]);
    return i;
  };
  const ti = col(opts.mapping.time, 'time');
  const vi = col(opts.mapping.voltage, 'voltage');
  const ci = col(opts.mapping.current, 'current');
  const si = col(opts.mapping.soc, 'soc');
  const good: NewReadingRow[] = [];
  const errors: RowError[] = [];
  for (const { line, cells } of body) {
    const reasons: string[] = [];
    const at = parseLogTime(cells[ti] ?? '');
    if (!at) reasons.push(`time "${(cells[ti] ?? '').slice(0, 40)}" is not a date and time`);
    const v = numberCell(cells[vi]);
    if (v === undefined) reasons.push('no voltage');
    else if (Number.isNaN(v) || v < 0 || v > 80) reasons.push(`voltage "${(cells[vi] ?? '').slice(0, 20)}" is not a number from 0 to 80`);
    const c = ci >= 0 ? numberCell(cells[ci]) : undefined;
    if (c !== undefined && (Number.isNaN(c) || Math.abs(c) > 1000)) reasons.push(`current "${(cells[ci] ?? '').slice(0, 20)}" is not a number from -1000 to 1000`);
    const s = si >= 0 ? numberCell(cells[si]) : undefined;
    if (s !== undefined && (Number.isNaN(s) || s < 0 || s > 100)) reasons.push(`state of charge "${(cells[si] ?? '').slice(0, 20)}" is not a number from 0 to 100`);
    if (reasons.length) errors.push({ line, reason: reasons.join('; ') });
    else good.push({ at: at!, voltage_v: v!, current_a: c ?? null, soc_percent: s ?? null, rested: opts.rested, place: 'terminals', note: '' });
  }
  if (errors.length && opts.allOrNothing) {
    throw new HttpError(422, 'unprocessable', `${errors.length} of ${body.length} rows are not valid; nothing was stored (all or nothing).`, errors.slice(0, 100).map((e) => ({ path: `line ${e.line}`, message: e.reason })));
  }
  if (!good.length) throw new HttpError(422, 'unprocessable', 'No row of the file is valid; nothing was stored.', errors.slice(0, 100).map((e) => ({ path: `line ${e.line}`, message: e.reason })));
  const key = `rigs/${rig.id}/logs/${randomUUID()}.csv`;
  await storage.put(key, file.buffer, 'text/csv');
  try {
    const upload = await db.transaction().execute(async (trx) => {
      const row = await insertUpload(trx, { rig_id: rig.id, kind: 'log', file_name: cleanName(file.originalname), content_type: 'text/csv', size_bytes: file.buffer.length, object_key: key, thumb_key: null, row_count: good.length, error_count: errors.length, errors: JSON.stringify(errors.slice(0, 200)), mapping: JSON.stringify(opts.mapping), created_by: userId, created_at: new Date() });
      await insertReadings(trx, rig.id, row.id, userId, good);
      await saveLogMapping(trx, rig.id, opts.mapping);
      return row;
    });
    return { upload: { id: upload.id, fileName: upload.file_name, rowCount: upload.row_count, errorCount: upload.error_count }, errors: errors.slice(0, 100) };
  } catch (err) {
    await storage.remove(key).catch(() => undefined);
    throw err;
  }
}

const PHOTO_TYPES = new Set(['image/jpeg', 'image/png']);

/** An install photo: JPEG or PNG by its bytes (HEIC refused with what to do), metadata stripped, a thumbnail made. */
export async function uploadPhoto(db: Db, storage: Storage, rig: RigAccess, userId: string, file: { buffer: Buffer; originalname: string }, caption: string) {
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
    const row = await insertUpload(db, { id, rig_id: rig.id, kind: 'photo', file_name: cleanName(file.originalname), content_type: detected.mime, size_bytes: cleaned.length, object_key: key, thumb_key: thumbKey, caption, created_by: userId, created_at: new Date() });
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

export async function removeUpload(db: Db, storage: Storage, rig: RigAccess, uploadId: string) {
  const upload = await findUpload(db, rig.id, uploadId);
  if (!upload) throw new HttpError(404, 'not_found', 'No such upload on this rig.');
  await deleteUpload(db, upload.id);
  for (const key of [upload.object_key, upload.thumb_key]) if (key) await storage.remove(key).catch(() => undefined);
}

const iso = (d: unknown) => new Date(d as Date).toISOString();

/** The Readings screen: spot readings, a chart-sized sample of all readings with the model's projection over the same time, uploads, photos and the analysis. */
export async function readingsOf(db: Db, storage: Storage, rig: RigAccess) {
  const power = rigPowerSchema.parse(rig.power);
  const [spot, sample, all, uploads, loads] = await Promise.all([spotReadings(db, rig.id), sampledReadings(db, rig.id, 1500), allReadings(db, rig.id), uploadsOf(db, rig.id), loadsOfRigs(db, [rig.id])]);
  const analysis = analyzeReadings({
    chemistry: power.battery.chemistry,
    capacityAh: power.battery.capacityAh,
    systemVoltage: power.systemVoltage,
    readings: all.map((r) => ({ at: iso(r.at), voltageV: r.voltage_v, currentA: r.current_a, socPercent: r.soc_percent, rested: r.rested })),
  });
  const socByAt = new Map(analysis.readings.map((r) => [r.at, r.socPercent]));
  const p = project(modelInput(power, loads.map(loadFromRow)), { fixes: false });
  const standby = compareStandbyOf(analysis.drainA, p.standby);

  // The model over the readings' own time: parked, from the first known state of charge, starting at that hour.
  let projected: { at: string; socPercent: number }[] = [];
  const first = analysis.readings.find((r) => r.socPercent !== null);
  if (first && all.length > 1) {
    const start = new Date(first.at);
    const spanHours = Math.min(60 * 24, Math.ceil((new Date(iso(all[all.length - 1].at)).getTime() - start.getTime()) / 3_600_000) + 1);
    const run = project(modelInput({ ...power, battery: { ...power.battery, startSocPercent: first.socPercent! }, horizonDays: Math.max(1, Math.ceil(spanHours / 24)), start: { weekday: (start.getUTCDay() + 6) % 7, hour: start.getUTCHours() } }, loads.map(loadFromRow)), { fixes: false });
    projected = [{ at: start.toISOString(), socPercent: first.socPercent! }, ...run.series.slice(0, spanHours).map((s) => ({ at: new Date(start.getTime() + (s.hour + 1) * 3_600_000).toISOString(), socPercent: s.parkedSocPercent }))];
  }
  const photos = await Promise.all(
    uploads.filter((u) => u.kind === 'photo').map(async (u) => ({ id: u.id, caption: u.caption, fileName: u.file_name, by: u.by, createdAt: iso(u.created_at), thumbUrl: (await storage.signedUrl(u.thumb_key ?? u.object_key)).url })),
  );
  return {
    spot: spot.map((r) => ({ id: r.id, at: iso(r.at), voltageV: r.voltage_v, currentA: r.current_a, socPercent: r.soc_percent ?? socByAt.get(iso(r.at)) ?? null, rested: r.rested, place: r.place, note: r.note, by: r.by })),
    series: sample.map((r) => ({ at: iso(r.at), voltageV: r.voltage_v, socPercent: r.soc_percent ?? socByAt.get(iso(r.at)) ?? null, currentA: r.current_a, rested: r.rested })),
    total: all.length,
    projected,
    uploads: uploads.filter((u) => u.kind === 'log').map((u) => ({ id: u.id, fileName: u.file_name, rowCount: u.row_count, errorCount: u.error_count, errors: (u.errors as RowError[] | null)?.slice(0, 20) ?? [], by: u.by, createdAt: iso(u.created_at) })),
    photos,
    analysis: { ...analysis, readings: undefined, standby, keyOffDrawA: power.keyOffDrawA, chemistry: power.battery.chemistry },
  };
}

function compareStandbyOf(drainA: number | null, standby: { inverterIdleAh: number; keyOffAh: number; selfDischargeAh: number }) {
  if (drainA === null) return null;
  return compareStandby(drainA, { inverterIdleA: standby.inverterIdleAh / 24, keyOffA: standby.keyOffAh / 24, selfDischargeA: standby.selfDischargeAh / 24 });
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
