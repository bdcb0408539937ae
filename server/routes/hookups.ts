import { Router } from 'express';

import { planHookup } from '@/shared/energy/hookup/plan';
import { hookupInputSchema } from '@/shared/schemas/hookup';
import { handler } from '../http/handler';

/** Open: a hook-up plan from a power system stores nothing (rate-limited in app.ts). */
export function hookupsRouter() {
  const router = Router();
  router.post('/', handler({ body: hookupInputSchema }, ({ body, res }) => {
    res.json(planHookup(body));
  }));
  return router;
}
