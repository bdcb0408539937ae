import { z } from 'zod';

import { loadSchema, rigPowerSchema } from './projection';

export const rigIdParamsSchema = z.object({ rigId: z.uuid() });

/** A new rig: its vehicle, power system and first loads. Without a household a new one is made for it. */
export const rigCreateSchema = z.strictObject({
  name: z.string().trim().min(1, 'Give the rig a name.').max(60),
  vehicle: z.string().trim().max(120).default(''),
  householdId: z.string().min(1).max(64).optional(),
  power: rigPowerSchema,
  loads: z.array(loadSchema).max(200).default([]),
});
export type RigCreateInput = z.infer<typeof rigCreateSchema>;
export type RigCreateForm = z.input<typeof rigCreateSchema>;
