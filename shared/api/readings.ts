import { z } from 'zod';

import { chemistrySchema } from '../schemas/projection';
import { columnMappingSchema, readingPlaceSchema } from '../schemas/reading';
import { dropTestSchema, readingsAnalysisSchema } from './model';

export { analyzeSchema, logUploadFieldsSchema, photoFieldsSchema, photoParamsSchema, readingParamsSchema, readingSchema, readingsQuerySchema, uploadParamsSchema, voltageDropSchema } from '../schemas/reading';

const nn = z.number().nullable();
const rowError = z.strictObject({ line: z.number().int(), reason: z.string() });

/** The measured drain held against the model's over the same quiet hours. */
export const modelComparisonSchema = z.strictObject({
  enough: z.boolean(),
  quietHours: z.number(),
  neededHours: z.number(),
  measuredA: z.number(),
  modelA: nn,
  differencePercent: nn,
  matches: z.boolean().nullable(),
  message: z.string(),
  causes: z.array(z.string()),
  suggestedKeyOffDrawA: nn,
});

/** GET /api/rigs/:rigId/readings: the Readings screen (docs/readings.md). */
export const readingsViewSchema = z.strictObject({
  timeZone: z.string(),
  total: z.number().int(),
  window: z.strictObject({ from: z.iso.datetime(), to: z.iso.datetime(), days: z.number(), clipped: z.boolean() }).nullable(),
  chart: z.strictObject({
    points: z.array(z.strictObject({ at: z.iso.datetime(), n: z.number(), voltageV: z.number(), currentA: nn, socPercent: nn })),
    model: z.array(z.strictObject({ at: z.iso.datetime(), socPercent: z.number() })),
  }),
  spot: z.array(
    z.strictObject({ id: z.uuid(), at: z.iso.datetime(), voltageV: z.number(), currentA: nn, socPercent: nn, rested: z.boolean(), place: readingPlaceSchema, note: z.string(), by: z.string().nullable(), canDelete: z.boolean() }),
  ),
  uploads: z.array(
    z.strictObject({ id: z.uuid(), fileName: z.string(), rowCount: z.number().int(), errorCount: z.number().int(), errors: z.array(rowError), by: z.string().nullable(), createdAt: z.iso.datetime(), canDelete: z.boolean() }),
  ),
  photos: z.array(z.strictObject({ id: z.uuid(), caption: z.string(), fileName: z.string(), by: z.string().nullable(), createdAt: z.iso.datetime(), thumbUrl: z.string(), canDelete: z.boolean() })),
  analysis: z.strictObject({
    ...readingsAnalysisSchema.shape,
    keyOffDrawA: z.number(),
    chemistry: chemistrySchema,
    quietHoursNeeded: z.number(),
    comparison: modelComparisonSchema.nullable(),
  }),
});
export type Readings = z.infer<typeof readingsViewSchema>;

/** POST /api/readings/analyze: each reading's state of charge and where it came from, and the drain. */
export const analysisAnswerSchema = z.strictObject({
  readings: z.array(z.strictObject({ at: z.string(), socPercent: nn, source: z.enum(['monitor', 'voltage']).nullable() })),
  ...readingsAnalysisSchema.shape,
});
export type ReadingsAnalysis = z.infer<typeof readingsAnalysisSchema>;

/** POST /api/rigs/:rigId/readings */
export const readingAddedSchema = z.strictObject({ ok: z.literal(true) });
export type ReadingAdded = z.infer<typeof readingAddedSchema>;

/** POST /api/rigs/:rigId/uploads/preview: the header, a few rows and a first guess at the mapping. */
export const logPreviewSchema = z.strictObject({
  columns: z.array(z.string()),
  sample: z.array(z.array(z.string())),
  rows: z.number().int(),
  delimiter: z.string(),
  decimalComma: z.boolean(),
  mapping: columnMappingSchema.partial(),
  remembered: z.boolean(),
});
export type LogPreview = z.infer<typeof logPreviewSchema>;

/** POST /api/rigs/:rigId/uploads */
export const uploadResultSchema = z.strictObject({
  upload: z.strictObject({ id: z.uuid(), fileName: z.string(), rowCount: z.number().int(), errorCount: z.number().int() }),
  errors: z.array(rowError),
  notes: z.array(z.string()),
});
export type UploadResult = z.infer<typeof uploadResultSchema>;

/** POST /api/rigs/:rigId/photos */
export const photoAddedSchema = z.strictObject({ id: z.uuid() });
export type PhotoAdded = z.infer<typeof photoAddedSchema>;

/** GET /api/rigs/:rigId/photos/:photoId: fresh signed addresses (they expire after a few minutes). */
export const photoUrlsSchema = z.strictObject({ id: z.uuid(), url: z.string(), thumbUrl: z.string(), expiresAt: z.iso.datetime(), caption: z.string(), fileName: z.string() });
export type PhotoUrls = z.infer<typeof photoUrlsSchema>;

export const dropVerdictSchema = z.strictObject({ allowedPercent: z.number(), within: z.boolean(), message: z.string() });

/** POST /api/rigs/:rigId/voltage-drop */
export const dropResultSchema = z.strictObject({ ...dropTestSchema.shape, cableRun: z.string().nullable(), verdict: dropVerdictSchema.nullable() });
export type DropResult = z.infer<typeof dropResultSchema>;
