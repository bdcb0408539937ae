import { z } from 'zod';

// Fixes applied to a saved rig: preview (anyone in the household), apply and undo (the owner).
export const fixKindSchema = z.enum(['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect', 'more-driving', 'more-battery', 'solar'], 'Choose one of the rig\'s Fixes.');

export const fixPreviewSchema = z.strictObject({ kind: fixKindSchema });
export const fixApplySchema = z.strictObject({ kind: fixKindSchema, version: z.number().int().min(1) });
export type FixApplyInput = z.infer<typeof fixApplySchema>;

export const historyEntryParamsSchema = z.object({ rigId: z.uuid(), entryId: z.uuid('Not a history entry.') });
