import { Router } from 'express';

import { noteCreatedSchema, noteCreateSchema, noteEditSchema, noteParamsSchema, notesSchema } from '@/shared/api/notes';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import * as notes from '../services/notes';

/** /api/rigs/:rigId/notes: the rig's notes, in threads. Writing one tells the other side; no margin check. */
export function notesRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });
  const me = (res: Parameters<typeof session>[0]) => session(res).user.id;

  router.get('/notes', rigAccess(db, { rig: ['read'] }), handler({ response: notesSchema }, ({ res }) => notes.notesOf(db, rigOf(res), me(res))));

  router.post('/notes', rigAccess(db, { note: ['create'] }), handler({ body: noteCreateSchema, response: noteCreatedSchema, status: 201 }, async ({ body, res }) => ({
    id: await notes.addNote(ctx, rigOf(res), me(res), body),
  })));

  router.post('/notes/read', rigAccess(db, { rig: ['read'] }), handler({ status: 204 }, async ({ res }) => {
    await notes.readNotes(db, rigOf(res), me(res));
  }));

  router.patch('/notes/:noteId', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema, body: noteEditSchema, status: 204 }, async ({ params, body, res }) => {
    await notes.editNote(db, rigOf(res), params.noteId, me(res), body.body);
  }));

  router.delete('/notes/:noteId', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema, status: 204 }, async ({ params, res }) => {
    await notes.removeNote(db, rigOf(res), params.noteId, me(res));
  }));

  router.post('/notes/:noteId/resolve', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema, status: 204 }, async ({ params, res }) => {
    await notes.resolveThread(db, rigOf(res), params.noteId, true);
  }));

  router.post('/notes/:noteId/reopen', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema, status: 204 }, async ({ params, res }) => {
    await notes.resolveThread(db, rigOf(res), params.noteId, false);
  }));

  return router;
}
