import { Router } from 'express';

import { loadParamsSchema, loadSchema, savedLoadSchema } from '@/shared/api/loads';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import * as rigs from '../services/rigs';

/** /api/rigs/:rigId/loads: the rig's loads. */
export function loadsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.post('/loads', rigAccess(db, { load: ['create'] }), handler({ body: loadSchema, response: savedLoadSchema, status: 201 }, ({ body, res }) =>
    rigs.addLoad(ctx, rigOf(res), actorOf(res), body)));

  // Members pass with update-own; the service refuses a load someone else added unless the role has update-any.
  router.patch('/loads/:loadId', rigAccess(db, { load: ['update-own'] }), handler({ params: loadParamsSchema, body: loadSchema, response: savedLoadSchema }, async ({ params, body, res }) => {
    const { load } = await rigs.editLoad(ctx, rigOf(res), actorOf(res), params.loadId, body);
    return load;
  }));

  router.delete('/loads/:loadId', rigAccess(db, { load: ['delete-own'] }), handler({ params: loadParamsSchema, status: 204 }, async ({ params, res }) => {
    await rigs.removeLoad(ctx, rigOf(res), actorOf(res), params.loadId);
  }));

  return router;
}
