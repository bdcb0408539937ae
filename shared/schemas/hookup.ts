import { z } from 'zod';

import { cableRunSizeSchema } from './cable-run';
import { inverterConnectionSchema, inverterControlSchema, projectionBaseSchema } from './projection';

// POST /api/hookups and GET /api/rigs/:rigId/hookup: the inverter's hook-up planned from the rig's power system.

/** How the hook-up is built, beside what the power system already says (control, connection). */
export const hookupOptionsSchema = z.object({
  /** One-way length of the inverter feed, battery to inverter. */
  feedLengthM: cableRunSizeSchema.shape.lengthM.max(30, 'At most 30 m.').default(1.5),
  returnPath: z.enum(['cable', 'chassis']).default('cable'),
  /** Where the manual switch sits: at the battery (a switching breaker does both jobs) or elsewhere (fuse plus switch). */
  switchAt: z.enum(['battery', 'elsewhere']).default('battery'),
  /** The inverter has a remote on/off input the ignition relay can drive instead of switching the feed. */
  remoteOnOff: z.boolean().default(false),
  insulationC: cableRunSizeSchema.shape.insulationC,
  engineSpace: z.boolean().default(false),
});

export const hookupInputSchema = projectionBaseSchema.extend(hookupOptionsSchema.shape).superRefine((input, ctx) => {
  if (!input.inverter) ctx.addIssue({ code: 'custom', path: ['inverter'], message: 'A hook-up plan needs an inverter.' });
});
export type HookupInput = z.infer<typeof hookupInputSchema>;

const flag = z.enum(['true', 'false']).transform((v) => v === 'true');
const queryNumber = (schema: z.ZodNumber) => z.coerce.number({ error: 'Enter a number.' }).pipe(schema);

/** The saved rig's plan, optionally as a Fix would change it (?control=ignition-relay). */
export const rigHookupQuerySchema = z.strictObject({
  control: inverterControlSchema.optional(),
  connection: inverterConnectionSchema.optional(),
  feedLengthM: queryNumber(z.number().gt(0, 'The length must be more than 0 m.').max(30, 'At most 30 m.')).optional(),
  returnPath: z.enum(['cable', 'chassis']).optional(),
  switchAt: z.enum(['battery', 'elsewhere']).optional(),
  remoteOnOff: flag.optional(),
});
export type RigHookupQuery = z.infer<typeof rigHookupQuerySchema>;
