import { z } from 'zod';

export { emailParamsSchema } from '../schemas/email-prefs';

export const sentEmailSchema = z.strictObject({
  id: z.uuid(),
  kind: z.enum(['report', 'warning', 'notes']),
  subject: z.string(),
  sentAt: z.iso.datetime(),
  recipient: z.strictObject({ id: z.string().nullable(), name: z.string() }),
});
export type SentEmail = z.infer<typeof sentEmailSchema>;

/** GET /api/rigs/:rigId/emails: the reports, warnings and note e-mails sent about a rig, newest first. */
export const sentEmailListSchema = z.strictObject({ emails: z.array(sentEmailSchema) });
export type SentEmailList = z.infer<typeof sentEmailListSchema>;

export const historyEntrySchema = z.strictObject({
  id: z.uuid(),
  at: z.iso.datetime(),
  actor: z.strictObject({ id: z.string().nullable(), name: z.string() }),
  kind: z.enum(['rig-created', 'fix', 'cable-run-added', 'cable-run-edited', 'cable-run-removed', 'load-added', 'load-edited', 'load-removed', 'reading-added', 'reading-removed', 'battery', 'inverter', 'charging', 'routine', 'stay', 'rig', 'member-joined', 'member-left', 'member-removed', 'role-changed']),
  summary: z.string(),
  daysParkedBefore: z.number().nullable(),
  daysParkedAfter: z.number().nullable(),
  /** An applied Fix the owner can still undo. */
  undoable: z.boolean(),
});
export type HistoryEntry = z.infer<typeof historyEntrySchema>;

/** GET /api/rigs/:rigId/history */
export const historySchema = z.strictObject({ history: z.array(historyEntrySchema) });
export type History = z.infer<typeof historySchema>;
