import { randomUUID } from 'node:crypto';

import { trickleA, twoFigures } from '@/shared/energy/readings';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { type ColumnMapping, LOG_LIMITS } from '@/shared/schemas/reading';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { insertReadingColumns, insertUpload, lockAndCountReadings, saveLogMapping } from '../repositories/readings';
import { type Storage, storeThenSave } from '../storage';
import type { Actor } from './history';
import { parseLog, previewText, requireText } from './log-parse';
import { cleanName, recordReadingChange } from './readings-shared';
import { rigChanged, type WriteCtx } from './rig-changed';

const GUESS = { time: /time|date|stamp|zeit|datum/i, voltage: /volt|^v$|\(v\)|spannung/i, current: /curr|amp|^a$|\(a\)|strom/i, soc: /soc|state.*charge|%/i };

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

const yieldToLoop = () => new Promise<void>((r) => setImmediate(r));

/**
 * A CSV log: every row checked (line numbers and reasons for the bad ones), the good rows stored in one
 * transaction with the upload and its History line; with allOrNothing, nothing when any row is bad. The rig
 * keeps at most LOG_LIMITS.rigRows readings: a log that would pass it is refused whole. The file goes to
 * object storage first, and is removed again if the transaction fails (storeThenSave).
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
  const upload = await storeThenSave({ db, storage }, [{ key, body: file.buffer, contentType: 'text/csv' }], async (trx) => {
    const kept = await lockAndCountReadings(trx, rig.id);
    if (kept + rows.at.length > LOG_LIMITS.rigRows) {
      throw new HttpError(413, 'payload_too_large', `This rig keeps at most ${LOG_LIMITS.rigRows.toLocaleString('en-US')} readings; it has ${kept.toLocaleString('en-US')} and this log adds ${rows.at.length.toLocaleString('en-US')}. Delete an older log first.`, [{ path: 'file', message: 'The rig would keep too many readings.' }]);
    }
    const row = await insertUpload(trx, { rig_id: rig.id, kind: 'log', file_name: cleanName(file.originalname), content_type: 'text/csv', size_bytes: file.buffer.length, object_key: key, thumb_key: null, row_count: rows.at.length, error_count: errors.length, errors: JSON.stringify(errors.slice(0, 200)), mapping: JSON.stringify(opts.mapping), created_by: actor.id, created_at: new Date() });
    if (opts.rested && notRested) {
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
    await recordReadingChange(trx, rig, actor, 'reading-added', `uploaded the log ${row.file_name} (${row.row_count.toLocaleString('en-US')} readings)`);
    return row;
  });
  rigChanged(ctx, rig.id);
  const notes = notRested ? [`${notRested.toLocaleString('en-US')} rows marked rested carried more than a trickle (over ${twoFigures(trickle)} A) and are kept as not rested.`] : [];
  return { upload: { id: upload.id, fileName: upload.file_name, rowCount: upload.row_count, errorCount: upload.error_count }, errors: errors.slice(0, 100), notes };
}
