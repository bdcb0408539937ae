import type { Kysely, Transaction } from 'kysely';

import type { Db } from '@/db/client';
import type { Database } from '@/db/schema';

type Exec = Db | Transaction<Database> | Kysely<Database>;

/** An account's id and name (better-auth's user table), or undefined. */
export const findUser = (db: Exec, userId: string) => db.selectFrom('user').select(['id', 'name']).where('id', '=', userId).executeTakeFirst();
