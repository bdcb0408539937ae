import { z } from 'zod';

import { noteTargetKindSchema } from '../schemas/note';

export { noteCreateSchema, noteEditSchema, noteParamsSchema, noteTargetKindSchema } from '../schemas/note';

export type NoteTargetKind = z.infer<typeof noteTargetKindSchema>;
export const NOTE_TARGET_KINDS = noteTargetKindSchema.options;

export const noteSchema = z.strictObject({
  id: z.uuid(),
  parentId: z.uuid().nullable(),
  targetKind: noteTargetKindSchema,
  targetId: z.string().nullable(),
  targetName: z.string().nullable(),
  author: z.strictObject({ id: z.string(), name: z.string() }).nullable(),
  body: z.string(),
  rigVersion: z.number().int(),
  /** Set when the load the note is about has changed (or gone) since it was written. */
  writtenWhen: z.string().nullable(),
  resolved: z.boolean(),
  edited: z.boolean(),
  createdAt: z.iso.datetime(),
  mine: z.boolean(),
});
export type Note = z.infer<typeof noteSchema>;
export const threadSchema = z.strictObject({ ...noteSchema.shape, replies: z.array(noteSchema) });
export type Thread = z.infer<typeof threadSchema>;

/** GET /api/rigs/:rigId/notes */
export const notesSchema = z.strictObject({ threads: z.array(threadSchema), unread: z.number().int() });
export type Notes = z.infer<typeof notesSchema>;

/** POST /api/rigs/:rigId/notes */
export const noteCreatedSchema = z.strictObject({ id: z.uuid() });
export type NoteCreated = z.infer<typeof noteCreatedSchema>;
