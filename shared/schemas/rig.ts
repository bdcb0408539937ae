import { z } from 'zod';

import './error-map';

import type { HouseholdRole } from '../permissions';
import { loadSchema, rigPowerSchema } from './projection';

/** What the caller may do with a rig, worked out on the server from their household role. */
export type RigPermissions = {
  edit: boolean;
  delete: boolean;
  /** Add loads, and edit or delete the ones this person added. */
  manageLoads: boolean;
  /** Edit or delete any load, whoever added it (the owner). */
  editAnyLoad: boolean;
  managePeople: boolean;
  comment: boolean;
};

/** What every answer about a rig carries (the rig, the Rigs list): which rig, whose, and what the caller may do. */
export type RigHeader = {
  id: string;
  name: string;
  vehicle: string;
  householdId: string;
  householdName: string;
  role: HouseholdRole;
  /** The caller's own user id, to tell their loads from the others'. */
  viewerId: string;
  permissions: RigPermissions;
  version: number;
  /** ISO 8601. */
  updatedAt: string;
};

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
