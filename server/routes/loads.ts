import { Router } from 'express';

import { loadSchema } from '@/shared/schemas/projection';
import { loadParamsSchema } from '@/shared/schemas/rig';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import * as rigs from '../services/rigs';

/** /api/rigs/:rigId/loads: the rig's loads. */
export function loadsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.post('/loads', rigAccess(db, { load: ['create'] }), handler({ body: loadSchema }, async ({ body, res }) => {
    res.status(201).json(await rigs.addLoad(ctx, rigOf(res), actorOf(res), body));
  }));

  // Members pass with update-own; the service refuses a load someone else added unless the role has update-any.
  router.patch('/loads/:loadId', rigAccess(db, { load: ['update-own'] }), handler({ params: loadParamsSchema, body: loadSchema }, async ({ params, body, res }) => {
    const { load } = await rigs.editLoad(ctx, rigOf(res), actorOf(res), params.loadId, body);
    res.json(load);
  }));

  router.delete('/loads/:loadId', rigAccess(db, { load: ['delete-own'] }), handler({ params: loadParamsSchema }, async ({ params, res }) => {
    await rigs.removeLoad(ctx, rigOf(res), actorOf(res), params.loadId);
    res.status(204).end();
  }));

  return router;
}
