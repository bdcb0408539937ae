import { Router } from 'express';

import { fixApplySchema, fixPreviewSchema } from '@/shared/schemas/fix';
import { rigHookupQuerySchema } from '@/shared/schemas/hookup';
import { rigCreateSchema, rigUpdateSchema, tryLoadsSchema } from '@/shared/schemas/rig';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf, session } from '../middleware/session';
import { applyFix, previewFix } from '../services/fixes';
import { rigHookup } from '../services/hookup';
import * as rigs from '../services/rigs';

/** /api/rigs: the rigs themselves, their Outlook, Try, Fixes and hook-up (after requireSession, app.ts). */
export function rigsRouter(ctx: AppContext) {
  const { db, auth, storage } = ctx;
  const router = Router();

  router.get('/', async (_req, res) => {
    res.json({ rigs: await rigs.listRigs(db, session(res).user.id) });
  });

  router.post('/', handler({ body: rigCreateSchema }, async ({ body, res }) => {
    const id = await rigs.createRig(db, auth, actorOf(res), body);
    res.status(201).location(`/api/rigs/${id}`).json({ id });
  }));

  router.get('/:rigId', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await rigs.readRig(db, rigOf(res)));
  });

  router.patch('/:rigId', rigAccess(db, { rig: ['update'] }), handler({ body: rigUpdateSchema }, async ({ body, res }) => {
    const { changed: _changed, ...rig } = await rigs.changeRig(ctx, rigOf(res), actorOf(res), body);
    res.json(rig);
  }));

  router.delete('/:rigId', rigAccess(db, { rig: ['delete'] }), async (req, res) => {
    const left = await rigs.removeRig(db, storage, rigOf(res).id);
    if (left.length) req.log.error({ keys: left }, 'objects of a deleted rig are still in the store');
    res.status(204).end();
  });

  router.get('/:rigId/outlook', rigAccess(db, { rig: ['read'] }), async (req, res) => {
    const body = await rigs.rigOutlook(db, rigOf(res));
    // Never stored (private data); a client that kept the answer itself may still ask with its tag (304). Gzip when the client takes it.
    res.set({ ETag: body.etag, 'Cache-Control': 'no-store', Vary: 'Accept-Encoding' });
    if (req.fresh) return res.status(304).end();
    res.type('json');
    if (req.acceptsEncodings('gzip', 'identity') === 'gzip') return res.set('Content-Encoding', 'gzip').send(body.gzip);
    res.send(body.json);
  });

  router.post('/:rigId/try', rigAccess(db, { rig: ['read'] }), handler({ body: tryLoadsSchema }, async ({ body, res }) => {
    res.json(await rigs.tryLoads(db, rigOf(res), body.candidates));
  }));

  router.get('/:rigId/hookup', rigAccess(db, { rig: ['read'] }), handler({ query: rigHookupQuerySchema }, async ({ query, res }) => {
    res.json(await rigHookup(db, rigOf(res), query));
  }));

  router.post('/:rigId/fixes/preview', rigAccess(db, { rig: ['read'] }), handler({ body: fixPreviewSchema }, async ({ body, res }) => {
    res.json(await previewFix(db, rigOf(res), body.kind));
  }));

  router.post('/:rigId/fixes/apply', rigAccess(db, { rig: ['update'] }), handler({ body: fixApplySchema }, async ({ body, res }) => {
    res.json(await applyFix(ctx, rigOf(res), actorOf(res), body.kind, body.version));
  }));

  return router;
}
