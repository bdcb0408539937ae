import { type Kysely, sql } from 'kysely';

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('cable_runs')
    .addColumn('id', 'uuid', (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn('rig_id', 'uuid', (c) => c.notNull().references('rigs.id').onDelete('cascade'))
    .addColumn('load_id', 'uuid', (c) => c.references('loads.id').onDelete('set null'))
    .addColumn('created_by', 'text', (c) => c.references('user.id').onDelete('set null'))
    .addColumn('label', 'text', (c) => c.notNull())
    .addColumn('from_point', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('to_point', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('length_m', 'double precision', (c) => c.notNull())
    .addColumn('current_a', 'double precision')
    .addColumn('max_drop_percent', 'double precision', (c) => c.notNull())
    .addColumn('insulation_c', 'integer', (c) => c.notNull())
    .addColumn('engine_space', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('return_path', 'text', (c) => c.notNull().check(sql`return_path in ('cable', 'chassis')`))
    .addColumn('continuous', 'boolean', (c) => c.notNull().defaultTo(false))
    .addColumn('purpose', 'text', (c) => c.notNull().defaultTo('general'))
    .addColumn('existing_awg', 'text')
    .addColumn('existing_mm2', 'double precision')
    .addColumn('created_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn('updated_at', 'timestamptz', (c) => c.notNull().defaultTo(sql`now()`))
    .addCheckConstraint('cable_runs_current_or_load', sql`current_a is not null or load_id is not null`)
    .execute();
  await db.schema.createIndex('cable_runs_rig_idx').on('cable_runs').column('rig_id').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('cable_runs').execute();
}
