import { Router } from 'express';

import { historyEntryParamsSchema } from '@/shared/schemas/fix';
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

  router.get('/history', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json({ history: await historyOf(db, rigOf(res).id) });
  });

  router.post('/history/:entryId/undo', rigAccess(db, { rig: ['update'] }), handler({ params: historyEntryParamsSchema }, async ({ params, res }) => {
    res.json(await undoFix(ctx, rigOf(res), actorOf(res), params.entryId));
  }));

  return router;
}
