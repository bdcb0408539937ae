import { Router } from 'express';

import { compare } from '@/shared/energy/compare';
import { project } from '@/shared/energy/project';
import { compareInputSchema, comparisonSchema, projectionInputSchema, projectionSchema } from '@/shared/api/projections';
import { HttpError } from '../errors';
import { handler } from '../http/handler';

/** Open routes: they store nothing, so anyone may run the model (rate-limited in app.ts). */
export function projectionsRouter() {
  const router = Router();
  router.post('/', handler({ body: projectionInputSchema, response: projectionSchema }, ({ body }) => project(body)));
  router.post('/compare', handler({ body: compareInputSchema, response: comparisonSchema }, ({ body: input }) => {
    if (input.candidates.length === 0 && !input.rig.loads.some((l) => l.status === 'candidate')) {
      throw new HttpError(400, 'validation_failed', 'Give at least one candidate load to try.', [
        { path: 'candidates', message: 'Add a candidate load, or mark one of the rig\'s loads as a candidate.' },
      ]);
    }
    return compare(input);
  }));
  return router;
}
