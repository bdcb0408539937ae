import { Router } from 'express';

import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { householdsOfUser } from '../repositories/rigs';

/** /api/me: who is signed in, with their account role and households. */
export function meRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', async (_req, res) => {
    const { user } = session(res);
    res.json({
      user: { id: user.id, name: user.name, email: user.email, role: user.role ?? 'traveller' },
      households: await householdsOfUser(db, user.id),
    });
  });
  return router;
}
