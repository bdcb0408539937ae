import { z } from 'zod';

import './error-map';

/** What a note can be about: the whole rig, a load, a cable run or a reading (a log or photo). */
export const noteTargetKindSchema = z.enum(['rig', 'load', 'cable-run', 'reading']);

export const noteCreateSchema = z
  .strictObject({
    body: z.string().trim().min(1, 'Write something first.').max(4000),
    targetKind: noteTargetKindSchema.default('rig'),
    targetId: z.uuid().optional(),
    parentId: z.uuid().optional(),
  })
  .superRefine((n, ctx) => {
    if (n.targetKind !== 'rig' && !n.targetId) ctx.addIssue({ code: 'custom', path: ['targetId'], message: 'Say which one the note is about.' });
  });
export type NoteCreateInput = z.infer<typeof noteCreateSchema>;
export type NoteCreateForm = z.input<typeof noteCreateSchema>;

export const noteEditSchema = z.strictObject({ body: noteCreateSchema.shape.body });
export const noteParamsSchema = z.object({ rigId: z.uuid(), noteId: z.uuid() });
