import { z } from 'zod';

import { hookupPlanSchema } from './model';

export { hookupInputSchema, rigHookupQuerySchema } from '../schemas/hookup';

/** POST /api/hookups */
export const hookupAnswerSchema = hookupPlanSchema;

/** GET /api/rigs/:rigId/hookup: the saved rig's plan, with its saved inverter feed where it has one. */
export const rigHookupSchema = z.strictObject({
  rigId: z.uuid(),
  version: z.number().int(),
  feedRun: z.strictObject({ id: z.uuid(), label: z.string() }).nullable(),
  ...hookupPlanSchema.shape,
});
export type RigHookup = z.infer<typeof rigHookupSchema>;
