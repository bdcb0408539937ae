import { z } from 'zod';

import { fixKindOutSchema, marginStateSchema, warningSchema } from './model';

export { fixApplySchema, fixPreviewSchema, historyEntryParamsSchema } from '../schemas/fix';

const fixSideSchema = z.strictObject({
  daysParked: z.number().nullable(),
  daysOnRoutine: z.number().nullable(),
  routineHolds: z.boolean(),
  dailyAh: z.number(),
  netAh: z.number(),
  marginDays: z.number().nullable(),
  marginState: marginStateSchema,
});
export type FixSide = z.infer<typeof fixSideSchema>;

/** POST /api/rigs/:rigId/fixes/preview: the rig before and after the Fix (nothing is saved). */
export const fixPreviewAnswerSchema = z.strictObject({
  kind: fixKindOutSchema,
  summary: z.string(),
  convenience: z.string(),
  change: z.record(z.string(), z.unknown()),
  before: fixSideSchema,
  after: fixSideSchema,
  warnings: z.array(warningSchema),
});
export type FixPreview = z.infer<typeof fixPreviewAnswerSchema>;
