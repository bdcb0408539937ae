import type { Db } from '@/db/client';
import { unreadCount } from '../repositories/notes';
import { listRigs } from './rigs';

const ORDER = { short: 0, tight: 1, comfortable: 2 } as const;

/** The rigs an advisor was invited to, each with its unread notes: Short first, then Tight, then Comfortable; sooner cut-off first. */
export async function clientsOf(db: Db, userId: string) {
  const rigs = (await listRigs(db, userId)).filter((r) => r.role === 'advisor');
  const withUnread = await Promise.all(rigs.map(async (r) => ({ ...r, unreadNotes: await unreadCount(db, userId, r.id) })));
  withUnread.sort((a, b) => ORDER[a.marginState] - ORDER[b.marginState] || (a.daysParked ?? Infinity) - (b.daysParked ?? Infinity));
  return withUnread;
}
