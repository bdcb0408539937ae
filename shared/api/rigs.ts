import { z } from 'zod';

import { householdRoleSchema } from '../schemas/people';
import { rigPowerSchema } from '../schemas/projection';
import { comparisonSchema, marginStateSchema, projectionSchema, tripOutlookSchema } from './model';
import { savedLoadSchema } from './loads';

export { rigCreateSchema, rigIdParamsSchema, rigUpdateSchema, sheetQuerySchema, tryLoadsSchema } from '../schemas/rig';

/** What the caller may do with a rig, worked out on the server from their household role. */
export const rigPermissionsSchema = z.strictObject({
  edit: z.boolean(),
  delete: z.boolean(),
  /** Add loads, and edit or delete the ones this person added. */
  manageLoads: z.boolean(),
  /** Edit or delete any load, whoever added it (the owner). */
  editAnyLoad: z.boolean(),
  /** Plan and change trips. */
  manageTrips: z.boolean(),
  managePeople: z.boolean(),
  comment: z.boolean(),
});

/** What every answer about a rig carries (the rig, the Rigs list): which rig, whose, and what the caller may do. */
export const rigHeaderShape = {
  id: z.uuid(),
  name: z.string(),
  vehicle: z.string(),
  householdId: z.string(),
  householdName: z.string(),
  role: householdRoleSchema,
  /** The caller's own user id, to tell their loads from the others'. */
  viewerId: z.string(),
  permissions: rigPermissionsSchema,
  version: z.number().int(),
  /** ISO 8601. */
  updatedAt: z.iso.datetime(),
};

export const rigHeaderSchema = z.strictObject(rigHeaderShape);
export type RigHeader = z.infer<typeof rigHeaderSchema>;
export type RigPermissions = z.infer<typeof rigPermissionsSchema>;

/** A rig in the Rigs list: its header and the figures of its card. */
export const rigSummarySchema = z.strictObject({
  ...rigHeaderShape,
  loadCount: z.number().int(),
  daysParked: z.number().nullable(),
  daysOnRoutine: z.number().nullable(),
  holds: z.boolean(),
  marginState: marginStateSchema,
  horizonDays: z.number(),
});
export type RigSummary = z.infer<typeof rigSummarySchema>;

/** GET /api/rigs */
export const rigListSchema = z.strictObject({ rigs: z.array(rigSummarySchema) });
export type RigList = z.infer<typeof rigListSchema>;

/** GET /api/clients: the rigs shared with an advisor, with their unread notes. */
export const clientSchema = z.strictObject({ ...rigSummarySchema.shape, unreadNotes: z.number().int() });
export type Client = z.infer<typeof clientSchema>;
export const clientListSchema = z.strictObject({ clients: z.array(clientSchema) });
export type ClientList = z.infer<typeof clientListSchema>;

/** GET /api/rigs/:rigId: the rig with its power system and loads. */
export const rigSchema = z.strictObject({ ...rigHeaderShape, power: rigPowerSchema, loads: z.array(savedLoadSchema) });
export type Rig = z.infer<typeof rigSchema>;

/** POST /api/rigs */
export const rigCreatedSchema = z.strictObject({ id: z.uuid() });
export type RigCreated = z.infer<typeof rigCreatedSchema>;
/** PATCH /api/rigs/:rigId, POST fixes/apply, POST history/:entryId/undo: the rig's new version. */
export const rigVersionSchema = z.strictObject({ id: z.uuid(), version: z.number().int() });
export type RigVersion = z.infer<typeof rigVersionSchema>;

/** A trip's outlook as the API sends it: the trip's id and name beside the model's answer. */
export const tripOutlookAnswerSchema = z.strictObject({ tripId: z.uuid(), name: z.string(), ...tripOutlookSchema.shape });
export type TripOutlookAnswer = z.infer<typeof tripOutlookAnswerSchema>;

/** GET /api/rigs/:rigId/outlook: the saved rig through the model, and its active trip's outlook. */
export const outlookSchema = z.strictObject({ rigId: z.uuid(), version: z.number().int(), ...projectionSchema.shape, trip: tripOutlookAnswerSchema.nullable() });
export type Outlook = z.infer<typeof outlookSchema>;

/** POST /api/rigs/:rigId/try */
export const tryResultSchema = comparisonSchema;
export type TryAnswer = z.infer<typeof tryResultSchema>;
