// CSV logs as people have them: comma, semicolon or tab delimiters (papaparse detects them), decimal
// commas, discharge counted either way, times with or without an offset. Parsed in slices that give the
// event loop back between them, so a 200,000-row upload does not stall other requests.
import { fileTypeFromBuffer } from 'file-type';
import Papa from 'papaparse';

import { type ColumnMapping, LOG_LIMITS } from '@/shared/schemas/reading';
import { HttpError } from '../errors';

const yieldToLoop = () => new Promise<void>((r) => setImmediate(r));

/** The bytes must be text: no other file type detected, no NUL bytes, valid UTF-8 (decoded in 256 KB slices, giving the event loop back between them). */
export async function requireText(buf: Buffer) {
  const detected = await fileTypeFromBuffer(buf);
  if (detected) throw new HttpError(415, 'unsupported_media_type', `This file is a ${detected.ext.toUpperCase()} (${detected.mime}), not a CSV log. Export the log as CSV text.`, [{ path: 'file', message: 'Not a CSV file.' }]);
  if (buf.includes(0)) throw new HttpError(415, 'unsupported_media_type', 'This file is not text; a CSV log is plain text with one reading a line.', [{ path: 'file', message: 'Not a CSV file.' }]);
  const decoder = new TextDecoder('utf-8', { fatal: false });
  let text = '';
  let blank = true;
  for (let i = 0; i < buf.length; i += 256 * 1024) {
    let piece = decoder.decode(buf.subarray(i, i + 256 * 1024), { stream: i + 256 * 1024 < buf.length });
    if (piece.includes('\uFFFD')) throw new HttpError(415, 'unsupported_media_type', 'This file is not UTF-8 text; save the log as CSV (UTF-8).', [{ path: 'file', message: 'Not UTF-8 text.' }]);
    if (i === 0) piece = piece.replace(/^\uFEFF/, '');
    blank &&= !/\S/.test(piece);
    text += piece;
    if (i + 256 * 1024 < buf.length) await yieldToLoop();
  }
  if (blank) throw new HttpError(400, 'validation_failed', 'The file is empty.', [{ path: 'file', message: 'The file is empty.' }]);
  return text;
}

const H = 3_600_000;

/** Wall-clock time in a zone to an instant; the zone's offset is looked up once an hour of the log. */
export function localTimeReader(timeZone: string) {
  if (timeZone === 'UTC') return (wallMs: number) => wallMs;
  const f = new Intl.DateTimeFormat('en-US', { timeZone, hourCycle: 'h23', year: 'numeric', month: 'numeric', day: 'numeric', hour: 'numeric', minute: 'numeric', second: 'numeric' });
  const cache = new Map<number, number>();
  const offsetAt = (utcMs: number) => {
    const key = Math.floor(utcMs / H);
    let off = cache.get(key);
    if (off === undefined) {
      const p = Object.fromEntries(f.formatToParts(new Date(key * H)).map((x) => [x.type, Number(x.value)]));
      off = Date.UTC(p.year, p.month - 1, p.day, p.hour, p.minute, p.second) - key * H;
      cache.set(key, off);
    }
    return off;
  };
  return (wallMs: number) => wallMs - offsetAt(wallMs - offsetAt(wallMs));
}

/**
 * A time from a log: ISO 8601 with its offset; "YYYY-MM-DD HH:MM[:SS]" or "DD.MM.YYYY HH:MM[:SS]" read in
 * the uploader's time zone; Unix seconds or milliseconds.
 */
export function parseLogTime(raw: string, fromLocal: (wallMs: number) => number = (ms) => ms): number | null {
  const v = raw.trim();
  if (/^\d{9,11}(\.\d+)?$/.test(v)) return Math.round(Number(v) * 1000);
  if (/^\d{12,13}$/.test(v)) return Number(v);
  const iso = v.match(/^(\d{4})-(\d{2})-(\d{2})[ T](\d{2}):(\d{2})(?::(\d{2})(\.\d+)?)?$/);
  const dotted = v.match(/^(\d{1,2})\.(\d{1,2})\.(\d{4})[ ,T]+(\d{1,2}):(\d{2})(?::(\d{2})(\.\d+)?)?$/);
  const p = iso ? [iso[1], iso[2], iso[3], iso[4], iso[5], iso[6], iso[7]] : dotted ? [dotted[3], dotted[2], dotted[1], dotted[4], dotted[5], dotted[6], dotted[7]] : null;
  if (p) {
    const [y, mo, d, h, mi] = p.slice(0, 5).map(Number);
    if (mo < 1 || mo > 12 || d < 1 || d > 31 || h > 23 || mi > 59) return null;
    const wall = Date.UTC(y, mo - 1, d, h, mi, Number(p[5] ?? 0), Math.round(Number(p[6] ?? 0) * 1000));
    if (new Date(wall).getUTCDate() !== d) return null;
    return fromLocal(wall);
  }
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}.*(Z|[+-]\d{2}:?\d{2})$/.test(v)) return null;
  const t = Date.parse(v);
  return Number.isNaN(t) ? null : t;
}

/** A number cell; with decimal commas "12,65" is 12.65 (and "1.234,5" is 1234.5). Empty is undefined, nonsense NaN. */
export function numberCell(raw: string | undefined, decimalComma = false): number | undefined {
  if (raw === undefined) return undefined;
  let v = raw.trim();
  if (v === '') return undefined;
  if (decimalComma) v = v.replace(/\.(?=\d{3}(\D|$))/g, '').replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(v)) return NaN;
  return Number(v);
}

export type ParsedRows = { at: number[]; voltage: number[]; current: (number | null)[]; soc: (number | null)[] };
export type RowError = { line: number; reason: string };

type Row = { line: number; cells: string[] };

/** Every row of the text, in slices of about 64 KB with the event loop given back after each. */
async function eachRow(text: string, onRows: (rows: Row[], delimiter: string) => void) {
  let line = 0;
  await new Promise<void>((resolve, reject) => {
    Papa.parse<string[]>(text, {
      header: false,
      delimiter: '',
      skipEmptyLines: false,
      chunkSize: 64 * 1024,
      chunk(results: Papa.ParseResult<string[]>, parser: Papa.Parser) {
        try {
          onRows(results.data.map((cells: string[]) => ({ line: ++line, cells })), results.meta.delimiter);
        } catch (err) {
          reject(err); // before abort(), which calls complete
          parser.abort();
          return;
        }
        parser.pause();
        void yieldToLoop().then(() => parser.resume());
      },
      complete: () => resolve(),
      error: (err: Error) => reject(err),
    });
  });
}

const blank = (cells: string[]) => cells.every((c) => c.trim() === '');

/** Whether number cells look written with a decimal comma: "12,6" with no point anywhere. */
const looksDecimalComma = (rows: string[][]) => {
  const cells = rows.flat().map((c) => c.trim());
  return cells.some((c) => /^[-+]?\d+,\d+$/.test(c)) && !cells.some((c) => /^[-+]?\d+\.\d+$/.test(c));
};

/** The header, a few rows, the row count and what papaparse found, from the first 64 KB (and a line count of the rest). */
export function previewText(text: string) {
  const head = text.slice(0, 64 * 1024);
  const parsed = Papa.parse<string[]>(head, { header: false, delimiter: '', skipEmptyLines: 'greedy', preview: 7 });
  const [header = [], ...sample] = parsed.data;
  let lines = 0;
  for (let i = text.indexOf('\n'); i >= 0; i = text.indexOf('\n', i + 1)) lines++;
  const trailing = text.endsWith('\n') ? 0 : 1;
  const rows = Math.max(0, lines + trailing - 1);
  if (!sample.length) throw new HttpError(400, 'validation_failed', 'The file has a header row but no readings.', [{ path: 'file', message: 'No rows under the header.' }]);
  return { header: header.map((h) => h.trim()), sample: sample.slice(0, 5), rows, delimiter: parsed.meta.delimiter, decimalComma: parsed.meta.delimiter !== ',' && looksDecimalComma(sample) };
}

/**
 * Every row checked against the mapping: the good ones as columns (times in ms, current positive when
 * drawn), the bad ones by line with the reasons.
 */
export async function parseLog(text: string, mapping: ColumnMapping, timeZone: string) {
  const fromLocal = localTimeReader(timeZone);
  const out: ParsedRows = { at: [], voltage: [], current: [], soc: [] };
  const errors: RowError[] = [];
  let header: string[] | null = null;
  let idx = { t: -1, v: -1, c: -1, s: -1 };
  let total = 0;
  const sign = mapping.currentSign === 'drawn-negative' ? -1 : 1;
  const dc = mapping.decimalComma;
  await eachRow(text, (rows) => {
    for (const { line, cells } of rows) {
      if (!header) {
        header = cells.map((h) => h.trim());
        const col = (name: string | undefined, field: keyof ColumnMapping) => {
          if (name === undefined) return -1;
          const i = header!.indexOf(name);
          if (i < 0) throw new HttpError(400, 'validation_failed', `No column named "${name}" in the file; its columns are: ${header!.join(', ')}.`, [{ path: `mapping.${field}`, message: `No column "${name}".` }]);
          return i;
        };
        idx = { t: col(mapping.time, 'time'), v: col(mapping.voltage, 'voltage'), c: col(mapping.current, 'current'), s: col(mapping.soc, 'soc') };
        continue;
      }
      if (blank(cells)) continue;
      if (++total > LOG_LIMITS.rows) continue;
      const reasons: string[] = [];
      const at = parseLogTime(cells[idx.t] ?? '', fromLocal);
      if (at === null) reasons.push(`time "${(cells[idx.t] ?? '').slice(0, 40)}" is not a date and time`);
      const v = numberCell(cells[idx.v], dc);
      if (v === undefined) reasons.push('no voltage');
      else if (Number.isNaN(v) || v < 0 || v > 80) reasons.push(`voltage "${(cells[idx.v] ?? '').slice(0, 20)}" is not a number from 0 to 80`);
      const c = idx.c >= 0 ? numberCell(cells[idx.c], dc) : undefined;
      if (c !== undefined && (Number.isNaN(c) || Math.abs(c) > 1000)) reasons.push(`current "${(cells[idx.c] ?? '').slice(0, 20)}" is not a number from -1000 to 1000`);
      const s = idx.s >= 0 ? numberCell(cells[idx.s], dc) : undefined;
      if (s !== undefined && (Number.isNaN(s) || s < 0 || s > 100)) reasons.push(`state of charge "${(cells[idx.s] ?? '').slice(0, 20)}" is not a number from 0 to 100`);
      if (reasons.length) {
        if (!dc && [idx.v, idx.c, idx.s].some((i) => i >= 0 && /^[-+]?\d+,\d+$/.test((cells[i] ?? '').trim()))) reasons.push('numbers with a decimal comma? say so at mapping');
        errors.push({ line, reason: reasons.join('; ') });
        continue;
      }
      out.at.push(at!);
      out.voltage.push(v!);
      out.current.push(c === undefined ? null : c === 0 ? 0 : c * sign);
      out.soc.push(s ?? null);
    }
  });
  if (!total) throw new HttpError(400, 'validation_failed', 'The file has a header row but no readings.', [{ path: 'file', message: 'No rows under the header.' }]);
  if (total > LOG_LIMITS.rows) throw new HttpError(413, 'payload_too_large', `The log has ${total.toLocaleString('en-US')} rows; at most ${LOG_LIMITS.rows.toLocaleString('en-US')} in one upload.`, [{ path: 'file', message: 'Too many rows.' }]);
  return { rows: out, errors, total };
}
