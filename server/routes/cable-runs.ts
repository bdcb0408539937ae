import { Router } from 'express';

import { NoConductorError, sizeCableRun } from '@/shared/energy/wiring';
import { cableRunSizeSchema } from '@/shared/schemas/cable-run';
import { HttpError } from '../errors';
import { parsed, validate } from '../middleware/validate';

/** Open: sizing a run stores nothing. */
export function cableRunsRouter() {
  const router = Router();
  router.post('/size', validate(cableRunSizeSchema), (_req, res) => {
    const input = parsed(res, cableRunSizeSchema);
    try {
      res.json(sizeCableRun(input));
    } catch (err) {
      if (err instanceof NoConductorError) {
        throw new HttpError(422, 'no_conductor', err.message, [{ path: 'currentA', message: 'No conductor in the table carries this current within the limits.' }]);
      }
      throw err;
    }
  });
  return router;
}
