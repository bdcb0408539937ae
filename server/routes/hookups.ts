import { Router } from 'express';

import { planHookup } from '@/shared/energy/hookup/plan';
import { hookupInputSchema } from '@/shared/schemas/hookup';
import { parsed, validate } from '../middleware/validate';

/** Open: a hook-up plan from a power system stores nothing (rate-limited in app.ts). */
export function hookupsRouter() {
  const router = Router();
  router.post('/', validate(hookupInputSchema), (_req, res) => {
    res.json(planHookup(parsed(res, hookupInputSchema)));
  });
  return router;
}
