import { type Kysely, sql } from 'kysely';

// A load can be marked essential (a Fix that stops it says so); a cable run can feed the inverter and
// take its current from the inverter's rating instead of a current or a load.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('loads').addColumn('essential', 'boolean', (c) => c.notNull().defaultTo(false)).execute();
  await db.schema.alterTable('cable_runs').addColumn('inverter_link', 'boolean', (c) => c.notNull().defaultTo(false)).execute();
  await db.schema.alterTable('cable_runs').dropConstraint('cable_runs_current_or_load').execute();
  await db.schema
    .alterTable('cable_runs')
    .addCheckConstraint('cable_runs_current_or_load', sql`current_a is not null or load_id is not null or inverter_link`)
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('cable_runs').dropConstraint('cable_runs_current_or_load').execute();
  await db.deleteFrom('cable_runs').where('current_a', 'is', null).where('load_id', 'is', null).execute();
  await db.schema.alterTable('cable_runs').addCheckConstraint('cable_runs_current_or_load', sql`current_a is not null or load_id is not null`).execute();
  await db.schema.alterTable('cable_runs').dropColumn('inverter_link').execute();
  await db.schema.alterTable('loads').dropColumn('essential').execute();
}
