import { Router } from 'express';

import { compare } from '@/shared/energy/compare';
import { project } from '@/shared/energy/project';
import { compareInputSchema, projectionInputSchema } from '@/shared/schemas/projection';
import { HttpError } from '../errors';
import { parsed, validate } from '../middleware/validate';

/** Open routes: they store nothing, so anyone may run the model (rate-limited in app.ts). */
export function projectionsRouter() {
  const router = Router();
  router.post('/', validate(projectionInputSchema), (_req, res) => {
    res.json(project(parsed(res, projectionInputSchema)));
  });
  router.post('/compare', validate(compareInputSchema), (_req, res) => {
    const input = parsed(res, compareInputSchema);
    if (input.candidates.length === 0 && !input.rig.loads.some((l) => l.status === 'candidate')) {
      throw new HttpError(400, 'validation_failed', 'Give at least one candidate load to try.', [
        { path: 'candidates', message: 'Add a candidate load, or mark one of the rig\'s loads as a candidate.' },
      ]);
    }
    res.json(compare(input));
  });
  return router;
}
