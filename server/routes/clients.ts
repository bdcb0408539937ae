import { Router } from 'express';

import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { clientsOf } from '../services/clients';

/** /api/clients: the rigs an advisor was invited to, Short first, then Tight, then Comfortable. */
export function clientsRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', async (_req, res) => {
    res.json({ clients: await clientsOf(db, session(res).user.id) });
  });
  return router;
}
