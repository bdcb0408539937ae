import { Router } from 'express';

import { compare } from '@/shared/energy/compare';
import { project } from '@/shared/energy/project';
import { compareInputSchema, projectionInputSchema } from '@/shared/schemas/projection';
import { HttpError } from '../errors';
import { handler } from '../http/handler';

/** Open routes: they store nothing, so anyone may run the model (rate-limited in app.ts). */
export function projectionsRouter() {
  const router = Router();
  router.post('/', handler({ body: projectionInputSchema }, ({ body, res }) => {
    res.json(project(body));
  }));
  router.post('/compare', handler({ body: compareInputSchema }, ({ body: input, res }) => {
    if (input.candidates.length === 0 && !input.rig.loads.some((l) => l.status === 'candidate')) {
      throw new HttpError(400, 'validation_failed', 'Give at least one candidate load to try.', [
        { path: 'candidates', message: 'Add a candidate load, or mark one of the rig\'s loads as a candidate.' },
      ]);
    }
    res.json(compare(input));
  }));
  return router;
}
