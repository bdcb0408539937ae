import { z } from 'zod';

import { timeZoneSchema } from './email-prefs';
import './error-map';

import { chemistrySchema } from './projection';

const num = (min: number, max: number) => z.number().finite().min(min).max(max);
const isoTime = z.iso.datetime({ offset: true, error: 'A time such as 2026-12-01T18:30:00Z.' });

export const readingPlaceSchema = z.enum(['terminals', 'device', 'ground']);

/** A spot reading typed in: time, battery voltage, optional current (positive when drawn), rested, where, a note. */
export const readingSchema = z.strictObject({
  at: isoTime,
  voltageV: num(0, 80),
  currentA: num(-1000, 1000).optional(),
  socPercent: num(0, 100).optional(),
  rested: z.boolean().default(false),
  place: readingPlaceSchema.default('terminals'),
  note: z.string().trim().max(500).default(''),
});
export type ReadingForm = z.input<typeof readingSchema>;
export type ReadingInputParsed = z.infer<typeof readingSchema>;

/** POST /api/readings/analyze: open, stores nothing (up to 10,000 readings in one request). */
export const analyzeSchema = z.strictObject({
  chemistry: chemistrySchema,
  capacityAh: num(1, 20_000),
  /** The battery you have: health and temperature make the usable capacity a fall in charge is worked on. */
  healthPercent: num(1, 100).default(100),
  temperatureC: num(-40, 60).default(25),
  systemVoltage: num(6, 60).default(12),
  readings: z
    .array(z.strictObject({ at: isoTime, voltageV: num(0, 80), currentA: num(-1000, 1000).nullish(), socPercent: num(0, 100).nullish(), rested: z.boolean() }))
    .min(1, 'Give at least one reading.')
    .max(10_000, 'At most 10,000 readings here; upload a longer log to a rig.'),
});

/** Which CSV column holds what (names from the file's header row). */
export const columnMappingSchema = z.strictObject({
  time: z.string().min(1, 'Choose the time column.'),
  voltage: z.string().min(1, 'Choose the voltage column.'),
  current: z.string().min(1).optional(),
  soc: z.string().min(1).optional(),
  /** Some monitors count discharge as negative: the stored current is always positive when drawn. */
  currentSign: z.enum(['drawn-positive', 'drawn-negative']).default('drawn-positive'),
  /** Numbers written with a decimal comma (12,65), as in semicolon- and tab-separated logs. */
  decimalComma: z.boolean().default(false),
});
export type ColumnMapping = z.infer<typeof columnMappingSchema>;
export type ColumnMappingInput = z.input<typeof columnMappingSchema>;

/** The form fields beside the file in a log upload (multipart: all strings). */
export const logUploadFieldsSchema = z.object({
  mapping: z
    .string({ error: 'Say which columns hold the time and the voltage.' })
    .transform((s, ctx) => {
      try {
        return JSON.parse(s) as unknown;
      } catch {
        ctx.addIssue({ code: 'custom', message: 'The column mapping is not JSON.' });
        return z.NEVER;
      }
    })
    .pipe(columnMappingSchema),
  /** "true": store nothing when any row is bad; otherwise the good rows are stored and the bad ones listed. */
  allOrNothing: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  /** "true": every row of this log is a rested battery (a parked period with nothing on). */
  rested: z.enum(['true', 'false']).default('false').transform((v) => v === 'true'),
  /** The uploader's time zone: times in the log without an offset are read in it (UTC when not given). */
  timeZone: timeZoneSchema.default('UTC'),
});

/** GET /api/rigs/:rigId/readings: the viewer's time zone, the model's schedule hours are local to it. */
export const readingsQuerySchema = z.object({ timeZone: timeZoneSchema.default('UTC') });

export const photoFieldsSchema = z.object({ caption: z.string().trim().max(200).default('') });

export const voltageDropSchema = z.strictObject({
  batteryV: num(0, 80),
  pointV: num(0, 80),
  currentA: z.number().finite().gt(0, 'The test needs a current flowing: more than 0 A.').max(1000),
  cableRunId: z.uuid().optional(),
});
export type VoltageDropForm = z.input<typeof voltageDropSchema>;

export const readingParamsSchema = z.object({ rigId: z.uuid(), readingId: z.uuid() });
export const uploadParamsSchema = z.object({ rigId: z.uuid(), uploadId: z.uuid() });
export const photoParamsSchema = z.object({ rigId: z.uuid(), photoId: z.uuid() });

/** One upload: 10 MB and 200,000 rows; a rig keeps at most 250,000 readings in all (delete a log to make room). */
export const LOG_LIMITS = { bytes: 10 * 1024 * 1024, rows: 200_000, rigRows: 250_000 } as const;
/** The chart of a view: at most this many points, averaged in the database. */
export const CHART_POINTS = 1000;
export const PHOTO_LIMIT_BYTES = 10 * 1024 * 1024;
