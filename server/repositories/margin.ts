import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;
type MarginState = 'comfortable' | 'tight' | 'short';

/** The rig's last seen margin, locked for the transaction (made Comfortable with no falls the first time). */
export async function lockMargin(trx: Transaction<Database>, rigId: string) {
  await trx.insertInto('rig_margin').values({ rig_id: rigId, state: 'comfortable', falls: 0, days_parked: null, checked_at: new Date(0) }).onConflict((oc) => oc.column('rig_id').doNothing()).execute();
  return trx.selectFrom('rig_margin').selectAll().where('rig_id', '=', rigId).forUpdate().executeTakeFirstOrThrow();
}

export async function saveMargin(db: Exec, rigId: string, m: { state: MarginState; falls: number; daysParked: number | null; checkedAt: Date; comfortableAt: Date | null }) {
  await db
    .updateTable('rig_margin')
    .set({ state: m.state, falls: m.falls, days_parked: m.daysParked, checked_at: m.checkedAt, comfortable_at: m.comfortableAt })
    .where('rig_id', '=', rigId)
    .execute();
}
