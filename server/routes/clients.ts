import { Router } from 'express';

import { clientListSchema } from '@/shared/api/rigs';
import type { AppContext } from '../context';
import { handler } from '../http/handler';
import { session } from '../middleware/session';
import { clientsOf } from '../services/clients';

/** /api/clients: the rigs an advisor was invited to, Short first, then Tight, then Comfortable. */
export function clientsRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', handler({ response: clientListSchema }, async ({ res }) => ({ clients: await clientsOf(db, session(res).user.id) })));
  return router;
}
