import { type Kysely, sql } from 'kysely';

/** A rig's history, each person's e-mail preferences, the margin state the warnings follow, and every e-mail sent. */
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('rig_history')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('actor_id', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('actor_name', 'text', (c) => c.notNull())
    .addColumn('kind', 'text', (c) => c.notNull())
    .addColumn('summary', 'text', (c) => c.notNull())
    .addColumn('days_parked_before', 'double precision')
    .addColumn('days_parked_after', 'double precision')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('rig_history_rig_idx').on('rig_history').columns(['rig_id', 'created_at']).execute();

  await db.schema
    .createTable('email_prefs')
    .addColumn('user_id', 'text', (c) => c.primaryKey().references('user.id').onDelete('cascade'))
    .addColumn('reports_on', 'boolean', (c) => c.notNull().defaultTo(true))
    .addColumn('report_weekday', 'integer', (c) => c.notNull().defaultTo(6).check(sql`report_weekday between 0 and 6`))
    .addColumn('report_hour', 'integer', (c) => c.notNull().defaultTo(18).check(sql`report_hour between 0 and 23`))
    .addColumn('time_zone', 'text', (c) => c.notNull().defaultTo('UTC'))
    .addColumn('warnings_on', 'boolean', (c) => c.notNull().defaultTo(true))
    .addColumn('warn_at', 'text', (c) => c.notNull().defaultTo('tight').check(sql`warn_at in ('tight', 'short')`))
    .addColumn('note_emails_on', 'boolean', (c) => c.notNull().defaultTo(true))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable('rig_margin')
    .addColumn('rig_id', 'uuid', (c) => c.primaryKey().references('rigs.id').onDelete('cascade'))
    .addColumn('state', 'text', (c) => c.notNull())
    .addColumn('falls', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('days_parked', 'double precision')
    .addColumn('checked_at', 'timestamptz', (c) => c.notNull())
    .execute();

  await db.schema
    .createTable('email_log')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('idempotency_key', 'text', (c) => c.notNull().unique())
    .addColumn('kind', 'text', (c) => c.notNull().check(sql`kind in ('report', 'warning', 'notes')`))
    .addColumn('user_id', 'text', (c) => c.references('user.id').onDelete('cascade'))
    .addColumn('rig_id', 'uuid', (c) => c.references('rigs.id').onDelete('cascade'))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('queued').check(sql`status in ('queued', 'sending', 'sent', 'failed')`))
    .addColumn('attempts', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('last_error', 'text')
    .addColumn('to_address', 'text')
    .addColumn('subject', 'text')
    .addColumn('html', 'text')
    .addColumn('text', 'text')
    .addColumn('chart_png', 'bytea')
    .addColumn('meta', 'jsonb')
    .addColumn('locked_at', 'timestamptz')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('sent_at', 'timestamptz')
    .execute();
  await db.schema.createIndex('email_log_rig_idx').on('email_log').columns(['rig_id', 'created_at']).execute();
  await db.schema.createIndex('email_log_status_idx').on('email_log').columns(['status']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const t of ['email_log', 'rig_margin', 'email_prefs', 'rig_history']) await db.schema.dropTable(t).execute();
}
