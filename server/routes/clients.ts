import { Router } from 'express';

import type { AppContext } from '../context';
import { session } from '../middleware/session';
import { unreadCount } from '../repositories/notes';
import { listRigs } from '../services/rigs';

const ORDER = { short: 0, tight: 1, comfortable: 2 } as const;

/** /api/clients: the rigs an advisor was invited to, Short first, then Tight, then Comfortable. */
export function clientsRouter({ db }: AppContext) {
  const router = Router();
  router.get('/', async (_req, res) => {
    const userId = session(res).user.id;
    const rigs = (await listRigs(db, userId)).filter((r) => r.role === 'advisor');
    const withUnread = await Promise.all(rigs.map(async (r) => ({ ...r, unreadNotes: await unreadCount(db, userId, r.id) })));
    withUnread.sort((a, b) => ORDER[a.marginState] - ORDER[b.marginState] || (a.daysParked ?? Infinity) - (b.daysParked ?? Infinity));
    res.json({ clients: withUnread });
  });
  return router;
}
