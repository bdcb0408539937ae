import { type Kysely, sql } from 'kysely';

/** Each invitation e-mail sent (new or resent), so sends can be limited per inviter and per household. */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('invitation_sends')
    .addColumn('id', 'bigserial', (c) => c.primaryKey())
    .addColumn('household_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('inviter_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('invitation_sends_household_idx').on('invitation_sends').columns(['household_id', 'created_at']).execute();
  await db.schema.createIndex('invitation_sends_inviter_idx').on('invitation_sends').columns(['inviter_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('invitation_sends').execute();
}
