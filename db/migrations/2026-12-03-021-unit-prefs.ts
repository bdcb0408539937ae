import { type Kysely, sql } from 'kysely';

// Each person's energy unit (Ah or Wh), kept on the account so the e-mails state figures in it. No row
// means the person never chose one on any device: amp-hours.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('unit_prefs')
    .addColumn('user_id', 'text', (c) => c.primaryKey().references('user.id').onDelete('cascade'))
    .addColumn('energy', 'text', (c) => c.notNull().defaultTo('Ah').check(sql`energy in ('Ah', 'Wh')`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('unit_prefs').execute();
}
