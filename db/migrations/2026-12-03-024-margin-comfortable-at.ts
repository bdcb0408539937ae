import type { Kysely } from 'kysely';

// When a rig was last seen Comfortable: a low-margin warning lists what changed since then, the same list
// whichever check of that fall (a second one running at once, a retry) writes the e-mail.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rig_margin').addColumn('comfortable_at', 'timestamptz').execute();
  await db.updateTable('rig_margin').set((eb) => ({ comfortable_at: eb.ref('checked_at') })).where('state', '=', 'comfortable').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('rig_margin').dropColumn('comfortable_at').execute();
}
