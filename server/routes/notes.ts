import { Router } from 'express';

import { noteCreateSchema, noteEditSchema, noteParamsSchema } from '@/shared/schemas/note';
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

  router.get('/notes', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await notes.notesOf(db, rigOf(res), me(res)));
  });

  router.post('/notes', rigAccess(db, { note: ['create'] }), handler({ body: noteCreateSchema }, async ({ body, res }) => {
    res.status(201).json({ id: await notes.addNote(ctx, rigOf(res), me(res), body) });
  }));

  router.post('/notes/read', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    await notes.readNotes(db, rigOf(res), me(res));
    res.status(204).end();
  });

  router.patch('/notes/:noteId', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema, body: noteEditSchema }, async ({ params, body, res }) => {
    await notes.editNote(db, rigOf(res), params.noteId, me(res), body.body);
    res.status(204).end();
  }));

  router.delete('/notes/:noteId', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema }, async ({ params, res }) => {
    await notes.removeNote(db, rigOf(res), params.noteId, me(res));
    res.status(204).end();
  }));

  router.post('/notes/:noteId/resolve', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema }, async ({ params, res }) => {
    await notes.resolveThread(db, rigOf(res), params.noteId, true);
    res.status(204).end();
  }));

  router.post('/notes/:noteId/reopen', rigAccess(db, { note: ['create'] }), handler({ params: noteParamsSchema }, async ({ params, res }) => {
    await notes.resolveThread(db, rigOf(res), params.noteId, false);
    res.status(204).end();
  }));

  return router;
}
