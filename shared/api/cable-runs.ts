import { z } from 'zod';

import { cableRunResultSchema } from './model';
import { cableTypeKeys, routeKeys } from '../schemas/cable-run';

export { cableRunParamsSchema, cableRunSchema, cableRunSizeSchema } from '../schemas/cable-run';

/** POST /api/cable-runs/size */
export const cableRunSizedSchema = cableRunResultSchema;
export type CableRunSized = z.infer<typeof cableRunSizedSchema>;

/** A saved cable run, with its sizing worked out now (null when no conductor in the table carries it). */
export const savedCableRunSchema = z.strictObject({
  id: z.uuid(),
  label: z.string(),
  from: z.string(),
  to: z.string(),
  lengthM: z.number(),
  currentA: z.number(),
  currentFrom: z.enum(['entered', 'load', 'inverter', 'missing']),
  loadId: z.uuid().nullable(),
  inverterLink: z.boolean(),
  loadName: z.string().nullable(),
  maxDropPercent: z.number(),
  route: z.enum(routeKeys),
  cableType: z.enum(cableTypeKeys),
  insulationC: z.number(),
  engineSpace: z.boolean(),
  returnPath: z.enum(['cable', 'chassis']),
  continuous: z.boolean(),
  purpose: z.enum(['general', 'inverter']),
  existingAwg: z.string().nullable(),
  existingMm2: z.number().nullable(),
  sizing: cableRunResultSchema.nullable(),
  warnings: z.array(z.string()),
});
export type SavedCableRun = z.infer<typeof savedCableRunSchema>;

/** GET /api/rigs/:rigId/cable-runs */
export const cableRunListSchema = z.strictObject({ cableRuns: z.array(savedCableRunSchema) });
export type CableRunList = z.infer<typeof cableRunListSchema>;
