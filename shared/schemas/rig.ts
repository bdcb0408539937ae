import { z } from 'zod';

import './error-map';

import { ROUTINE_KEYS } from '../routines';
import { batterySchema, loadSchema, rigPowerSchema } from './projection';

// What every answer about a rig carries, and what the caller may do with it: from the API's schema.
export type { RigHeader, RigPermissions } from '../api/rigs';

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

/**
 * New rig's form: the rig as created, plus the named routine the user started from (never sent: the
 * routine's minutes are). Nothing about the driving is assumed until the user picks one.
 */
export const rigSetupSchema = rigCreateSchema.extend({
  routine: z.enum([...ROUTINE_KEYS, 'own'], { error: 'Choose how the week\'s driving goes; you can adjust it after.' }),
});
export type RigSetupInput = z.infer<typeof rigSetupSchema>;
export type RigSetupForm = z.input<typeof rigSetupSchema>;

/** A change to a rig: its name, vehicle or power system, against the version the editor saw. */
export const rigUpdateSchema = z.strictObject({
  version: z.number().int().min(1),
  name: z.string().trim().min(1, 'Give the rig a name.').max(60).optional(),
  vehicle: z.string().trim().max(120).optional(),
  power: rigPowerSchema.optional(),
});
export type RigUpdateInput = z.infer<typeof rigUpdateSchema>;
export type RigUpdateForm = z.input<typeof rigUpdateSchema>;

/** The cut-off as set from "How this was worked out" (the rest of the power system is sent as it was). */
export const cutoffFormSchema = z.object({ cutoffSocPercent: batterySchema.shape.cutoffSocPercent.unwrap() });
export type CutoffForm = z.input<typeof cutoffFormSchema>;

/** GET /api/rigs/:rigId/sheet.pdf?size=a4|letter: the budget sheet's paper. */
export const sheetQuerySchema = z.strictObject({ size: z.enum(['a4', 'letter'], { error: 'Choose a4 or letter.' }).default('a4') });

export const loadParamsSchema = z.object({ rigId: z.uuid(), loadId: z.uuid() });

export const tryLoadsSchema = z.strictObject({
  /** Loads to try beside the rig's own candidates. */
  candidates: z.array(loadSchema).max(50).default([]),
});
