import { Router } from 'express';

import { fixApplySchema, fixPreviewAnswerSchema, fixPreviewSchema } from '@/shared/api/fixes';
import { rigHookupQuerySchema, rigHookupSchema } from '@/shared/api/hookups';
import { outlookSchema, rigCreatedSchema, rigCreateSchema, rigListSchema, rigSchema, rigUpdateSchema, rigVersionSchema, tryLoadsSchema, tryResultSchema } from '@/shared/api/rigs';
import type { AppContext } from '../context';
import { handler, SENT } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf, session } from '../middleware/session';
import { applyFix, previewFix } from '../services/fixes';
import { rigHookup } from '../services/hookup';
import * as rigs from '../services/rigs';

/** /api/rigs: the rigs themselves, their Outlook, Try, Fixes and hook-up (after requireSession, app.ts). */
export function rigsRouter(ctx: AppContext) {
  const { db, auth, storage } = ctx;
  const router = Router();

  router.get('/', handler({ response: rigListSchema }, async ({ res }) => ({ rigs: await rigs.listRigs(db, session(res).user.id) })));

  router.post('/', handler({ body: rigCreateSchema, response: rigCreatedSchema, status: 201 }, async ({ body, res }) => {
    const id = await rigs.createRig(db, auth, actorOf(res), body);
    res.location(`/api/rigs/${id}`);
    return { id };
  }));

  router.get('/:rigId', rigAccess(db, { rig: ['read'] }), handler({ response: rigSchema }, ({ res }) => rigs.readRig(db, rigOf(res))));

  router.patch('/:rigId', rigAccess(db, { rig: ['update'] }), handler({ body: rigUpdateSchema, response: rigVersionSchema }, async ({ body, res }) => {
    const { id, version } = await rigs.changeRig(ctx, rigOf(res), actorOf(res), body);
    return { id, version };
  }));

  router.delete('/:rigId', rigAccess(db, { rig: ['delete'] }), handler({ status: 204 }, async ({ req, res }) => {
    const left = await rigs.removeRig(db, storage, rigOf(res).id);
    if (left.length) req.log.error({ keys: left }, 'objects of a deleted rig are still in the store');
  }));

  // The answer is serialised (and gzipped) once per rig version, so the route sends those bytes itself.
  router.get('/:rigId/outlook', rigAccess(db, { rig: ['read'] }), handler({ response: outlookSchema }, async ({ req, res }) => {
    const body = await rigs.rigOutlook(db, rigOf(res));
    // Never stored (private data); a client that kept the answer itself may still ask with its tag (304). Gzip when the client takes it.
    res.set({ ETag: body.etag, 'Cache-Control': 'no-store', Vary: 'Accept-Encoding' });
    if (req.fresh) res.status(304).end();
    else if (req.acceptsEncodings('gzip', 'identity') === 'gzip') res.type('json').set('Content-Encoding', 'gzip').send(body.gzip);
    else res.type('json').send(body.json);
    return SENT;
  }));

  router.post('/:rigId/try', rigAccess(db, { rig: ['read'] }), handler({ body: tryLoadsSchema, response: tryResultSchema }, ({ body, res }) => rigs.tryLoads(db, rigOf(res), body.candidates)));

  router.get('/:rigId/hookup', rigAccess(db, { rig: ['read'] }), handler({ query: rigHookupQuerySchema, response: rigHookupSchema }, ({ query, res }) => rigHookup(db, rigOf(res), query)));

  router.post('/:rigId/fixes/preview', rigAccess(db, { rig: ['read'] }), handler({ body: fixPreviewSchema, response: fixPreviewAnswerSchema }, ({ body, res }) => previewFix(db, rigOf(res), body.kind)));

  router.post('/:rigId/fixes/apply', rigAccess(db, { rig: ['update'] }), handler({ body: fixApplySchema, response: rigVersionSchema }, ({ body, res }) => applyFix(ctx, rigOf(res), actorOf(res), body.kind, body.version)));

  return router;
}
