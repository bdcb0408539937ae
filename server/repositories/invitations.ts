import { sql, type Transaction } from 'kysely';

import type { Database } from '@/db/schema';

type Trx = Transaction<Database>;

/** Holds the sends of this inviter and this household until the transaction ends (several server processes count the same rows). */
export async function lockInvitationSends(trx: Trx, householdId: string, inviterId: string) {
  await sql`select pg_advisory_xact_lock(hashtext(${`invite:h:${householdId}`})), pg_advisory_xact_lock(hashtext(${`invite:u:${inviterId}`}))`.execute(trx);
}

/** How many invitation e-mails went out since a time, by inviter or by household, and when the oldest of them went. */
export async function invitationSendsSince(trx: Trx, by: 'inviter_id' | 'household_id', id: string, since: Date) {
  const row = await trx
    .selectFrom('invitation_sends')
    .select((eb) => [eb.fn.countAll<string>().as('n'), eb.fn.min('created_at').as('oldest')])
    .where(by, '=', id)
    .where('created_at', '>', since)
    .executeTakeFirstOrThrow();
  return { count: Number(row.n), oldest: row.oldest ? new Date(row.oldest as unknown as Date) : null };
}

export async function insertInvitationSend(trx: Trx, householdId: string, inviterId: string, at: Date) {
  await trx.insertInto('invitation_sends').values({ household_id: householdId, inviter_id: inviterId, created_at: at }).execute();
}
