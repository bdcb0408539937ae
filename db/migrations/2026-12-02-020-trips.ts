import { type Kysely, sql } from 'kysely';

// Trips on a rig: the plan (start date, arrival hour, battery placement, legs) kept as the JSON the trip
// schema checks; at most one active trip per rig.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('trips')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('start_date', 'text', (c) => c.notNull().check(sql`start_date ~ '^[0-9]{4}-[0-9]{2}-[0-9]{2}$'`))
    .addColumn('active', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('plan', 'jsonb', (c) => c.notNull())
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex('trips_rig_idx').on('trips').columns(['rig_id', 'start_date']).execute();
  await sql`create unique index trips_one_active_idx on trips (rig_id) where active`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('trips').execute();
}
