import { type Kysely, sql } from 'kysely';

// Migrations never import app code: they describe the tables as they were on the day.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('rigs')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    // Households are better-auth's organizations (created before these migrations run).
    .addColumn('household_id', 'text', (c) => c.notNull().references('organization.id').onDelete('cascade'))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('vehicle', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('power', 'jsonb', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('seed_key', 'text', (c) => c.unique())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('rigs_household_idx').on('rigs').column('household_id').execute();

  await db.schema
    .createTable('loads')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('added_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('supply', 'text', (c) => c.notNull().check(sql`supply in ('dc', 'ac')`))
    .addColumn('watts', 'double precision')
    .addColumn('amps', 'double precision')
    .addColumn('duty_percent', 'double precision', (c) => c.notNull().defaultTo(100))
    .addColumn('hours_per_day', 'double precision', (c) => c.notNull())
    .addColumn('start_hour', 'integer') // null: the hours are spread over the day
    .addColumn('weekdays', sql`integer[]`) // null: every day
    .addColumn('when', 'text', (c) => c.notNull().defaultTo('always').check(sql`"when" in ('always', 'parked', 'driving')`))
    .addColumn('status', 'text', (c) => c.notNull().defaultTo('installed').check(sql`status in ('installed', 'candidate')`))
    .addColumn('quantity', 'integer', (c) => c.notNull().defaultTo(1))
    .addColumn('position', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('loads_watts_or_amps', sql`watts is not null or amps is not null`)
    .execute();
  await db.schema.createIndex('loads_rig_idx').on('loads').column('rig_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('loads').execute();
  await db.schema.dropTable('rigs').execute();
}
