import { Router } from 'express';

import { NoConductorError, sizeCableRun } from '@/shared/energy/wiring';
import { cableRunListSchema, cableRunParamsSchema, cableRunSchema, cableRunSizedSchema, cableRunSizeSchema, savedCableRunSchema } from '@/shared/api/cable-runs';
import type { AppContext } from '../context';
import { HttpError } from '../errors';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import * as cableRuns from '../services/cable-runs';

/** /api/cable-runs, open: sizing a run stores nothing. */
export function cableRunsRouter() {
  const router = Router();
  router.post('/size', handler({ body: cableRunSizeSchema, response: cableRunSizedSchema }, ({ body }) => {
    try {
      return sizeCableRun(body);
    } catch (err) {
      if (err instanceof NoConductorError) {
        throw new HttpError(422, 'no_conductor', err.message, [{ path: 'currentA', message: 'No conductor in the table carries this current within the limits.' }]);
      }
      throw err;
    }
  }));
  return router;
}

/** /api/rigs/:rigId/cable-runs: the rig's saved cable runs. */
export function rigCableRunsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get('/cable-runs', rigAccess(db, { rig: ['read'] }), handler({ response: cableRunListSchema }, async ({ res }) => ({ cableRuns: await cableRuns.cableRunsOf(db, rigOf(res)) })));

  router.post('/cable-runs', rigAccess(db, { cableRun: ['create'] }), handler({ body: cableRunSchema, response: savedCableRunSchema, status: 201 }, ({ body, res }) =>
    cableRuns.addCableRun(ctx, rigOf(res), actorOf(res), body)));

  router.patch('/cable-runs/:runId', rigAccess(db, { cableRun: ['update'] }), handler({ params: cableRunParamsSchema, body: cableRunSchema, response: savedCableRunSchema }, ({ params, body, res }) =>
    cableRuns.editCableRun(ctx, rigOf(res), actorOf(res), params.runId, body)));

  router.delete('/cable-runs/:runId', rigAccess(db, { cableRun: ['delete'] }), handler({ params: cableRunParamsSchema, status: 204 }, async ({ params, res }) => {
    await cableRuns.removeCableRun(ctx, rigOf(res), actorOf(res), params.runId);
  }));

  return router;
}
