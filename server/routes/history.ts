import { Router } from 'express';

import { historyEntryParamsSchema } from '@/shared/api/fixes';
import { historySchema } from '@/shared/api/reports';
import { rigVersionSchema } from '@/shared/api/rigs';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { actorOf } from '../middleware/session';
import { undoFix } from '../services/fixes';
import { historyOf } from '../services/history';

/** /api/rigs/:rigId/history: what changed on the rig, and undoing an applied Fix. */
export function historyRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get('/history', rigAccess(db, { rig: ['read'] }), handler({ response: historySchema }, async ({ res }) => ({ history: await historyOf(db, rigOf(res).id) })));

  router.post('/history/:entryId/undo', rigAccess(db, { rig: ['update'] }), handler({ params: historyEntryParamsSchema, response: rigVersionSchema }, ({ params, res }) =>
    undoFix(ctx, rigOf(res), actorOf(res), params.entryId)));

  return router;
}
