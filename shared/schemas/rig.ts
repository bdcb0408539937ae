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

/** A change to a rig: its name, vehicle or power system, against the version the editor saw. */
export const rigUpdateSchema = z.strictObject({
  version: z.number().int().min(1),
  name: z.string().trim().min(1, 'Give the rig a name.').max(60).optional(),
  vehicle: z.string().trim().max(120).optional(),
  power: rigPowerSchema.optional(),
});
export type RigUpdateInput = z.infer<typeof rigUpdateSchema>;
export type RigUpdateForm = z.input<typeof rigUpdateSchema>;

export const loadParamsSchema = z.object({ rigId: z.uuid(), loadId: z.uuid() });

export const tryLoadsSchema = z.strictObject({
  /** Loads to try beside the rig's own candidates. */
  candidates: z.array(loadSchema).max(50).default([]),
});
