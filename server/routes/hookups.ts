import { Router } from 'express';

import { planHookup } from '@/shared/energy/hookup/plan';
import { hookupAnswerSchema, hookupInputSchema } from '@/shared/api/hookups';
import { handler } from '../http/handler';

/** Open: a hook-up plan from a power system stores nothing (rate-limited in app.ts). */
export function hookupsRouter() {
  const router = Router();
  router.post('/', handler({ body: hookupInputSchema, response: hookupAnswerSchema }, ({ body }) => planHookup(body)));
  return router;
}
