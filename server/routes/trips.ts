import { Router } from 'express';

import { tripParamsSchema, tripSchema } from '@/shared/schemas/trip';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import * as trips from '../services/trips';

/** /api/rigs/:rigId/trips: mounted after requireSession (app.ts); the household writes, everyone in it reads. */
export function rigTripsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get('/trips', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await trips.tripsOf(db, rigOf(res)));
  });
  router.post('/trips', rigAccess(db, { trip: ['create'] }), handler({ body: tripSchema }, async ({ body, res }) => {
    res.status(201).json(await trips.addTrip(ctx, rigOf(res), session(res).user.id, body));
  }));
  router.get('/trips/:tripId/outlook', rigAccess(db, { rig: ['read'] }), handler({ params: tripParamsSchema }, async ({ params, res }) => {
    res.json(await trips.tripOutlook(db, rigOf(res), params.tripId));
  }));
  router.put('/trips/:tripId', rigAccess(db, { trip: ['update'] }), handler({ params: tripParamsSchema, body: tripSchema }, async ({ params, body, res }) => {
    res.json(await trips.editTrip(ctx, rigOf(res), params.tripId, body));
  }));
  router.delete('/trips/:tripId', rigAccess(db, { trip: ['delete'] }), handler({ params: tripParamsSchema }, async ({ params, res }) => {
    await trips.removeTrip(ctx, rigOf(res), params.tripId);
    res.status(204).end();
  }));
  return router;
}
