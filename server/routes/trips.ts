import { Router } from 'express';

import { savedTripSchema, tripListSchema, tripOutlookAnswerSchema, tripParamsSchema, tripSchema } from '@/shared/api/trips';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import * as trips from '../services/trips';

/** /api/rigs/:rigId/trips: mounted after requireSession (app.ts); the household writes, everyone in it reads. */
export function rigTripsRouter(ctx: AppContext) {
  const { db } = ctx;
  const router = Router({ mergeParams: true });

  router.get('/trips', rigAccess(db, { rig: ['read'] }), handler({ response: tripListSchema }, ({ res }) => trips.tripsOf(db, rigOf(res))));
  router.post('/trips', rigAccess(db, { trip: ['create'] }), handler({ body: tripSchema, response: savedTripSchema, status: 201 }, ({ body, res }) =>
    trips.addTrip(ctx, rigOf(res), session(res).user.id, body)));
  router.get('/trips/:tripId/outlook', rigAccess(db, { rig: ['read'] }), handler({ params: tripParamsSchema, response: tripOutlookAnswerSchema }, ({ params, res }) => trips.tripOutlook(db, rigOf(res), params.tripId)));
  router.put('/trips/:tripId', rigAccess(db, { trip: ['update'] }), handler({ params: tripParamsSchema, body: tripSchema, response: savedTripSchema }, ({ params, body, res }) =>
    trips.editTrip(ctx, rigOf(res), params.tripId, body)));
  router.delete('/trips/:tripId', rigAccess(db, { trip: ['delete'] }), handler({ params: tripParamsSchema, status: 204 }, async ({ params, res }) => {
    await trips.removeTrip(ctx, rigOf(res), params.tripId);
  }));
  return router;
}
