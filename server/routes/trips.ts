import { Router } from 'express';

import { tripParamsSchema, tripSchema } from '@/shared/schemas/trip';
import type { AppContext } from '../context';
import { rigAccess, rigOf } from '../middleware/rig-access';
import { session } from '../middleware/session';
import { parsed, validate } from '../middleware/validate';
import * as trips from '../services/trips';

/** /api/rigs/:rigId/trips: mounted after requireSession (app.ts); the household writes, everyone in it reads. */
export function rigTripsRouter({ db }: AppContext) {
  const router = Router();
  const tripId = (res: Parameters<typeof session>[0]) => parsed(res, tripParamsSchema, 'params').tripId;

  router.get('/:rigId/trips', rigAccess(db, { rig: ['read'] }), async (_req, res) => {
    res.json(await trips.tripsOf(db, rigOf(res)));
  });
  router.post('/:rigId/trips', rigAccess(db, { trip: ['create'] }), validate(tripSchema), async (_req, res) => {
    res.status(201).json(await trips.addTrip(db, rigOf(res), session(res).user.id, parsed(res, tripSchema)));
  });
  router.get('/:rigId/trips/:tripId/outlook', rigAccess(db, { rig: ['read'] }), validate(tripParamsSchema, 'params'), async (_req, res) => {
    res.json(await trips.tripOutlook(db, rigOf(res), tripId(res)));
  });
  router.put('/:rigId/trips/:tripId', rigAccess(db, { trip: ['update'] }), validate(tripParamsSchema, 'params'), validate(tripSchema), async (_req, res) => {
    res.json(await trips.editTrip(db, rigOf(res), tripId(res), parsed(res, tripSchema)));
  });
  router.delete('/:rigId/trips/:tripId', rigAccess(db, { trip: ['delete'] }), validate(tripParamsSchema, 'params'), async (_req, res) => {
    await trips.removeTrip(db, rigOf(res), tripId(res));
    res.status(204).end();
  });
  return router;
}
