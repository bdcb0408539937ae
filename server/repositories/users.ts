import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;

/** An account's id and name (better-auth's user table), or undefined. */
export const findUser = (db: Exec, userId: string) => db.selectFrom('user').select(['id', 'name']).where('id', '=', userId).executeTakeFirst();

/** The person's energy unit as kept on the account, or undefined when they never chose one. */
export const findUnitPrefs = (db: Exec, userId: string) => db.selectFrom('unit_prefs').select(['energy']).where('user_id', '=', userId).executeTakeFirst();

export async function upsertUnitPrefs(db: Exec, userId: string, energy: 'Ah' | 'Wh') {
  await db
    .insertInto('unit_prefs')
    .values({ user_id: userId, energy, updated_at: new Date() })
    .onConflict((oc) => oc.column('user_id').doUpdateSet({ energy, updated_at: new Date() }))
    .execute();
}
