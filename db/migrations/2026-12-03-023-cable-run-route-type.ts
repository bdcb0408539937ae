import { type Kysely, sql } from 'kysely';

// A saved cable run keeps the same fields as Wire a circuit: where it runs (cabin, under the floor, engine
// bay) and the cable's type. Runs saved before read back from what they stored: the engine bay from
// engine_space, the type from its insulation rating (one type per rating). insulation_c and engine_space stay,
// written from the type and the route, for the readers that size from them.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .alterTable('cable_runs')
    .addColumn('route', 'text', (c) => c.notNull().defaultTo('cabin').check(sql`route in ('cabin', 'under-floor', 'engine-bay')`))
    .addColumn('cable_type', 'text', (c) =>
      c.notNull().defaultTo('marine').check(sql`cable_type in ('pvc', 'xlpe', 'marine', 'welding', 'other-60', 'other-75', 'high-temperature')`),
    )
    .execute();
  await sql`update cable_runs set route = case when engine_space then 'engine-bay' else 'cabin' end,
    cable_type = case insulation_c when 80 then 'pvc' when 125 then 'xlpe' when 90 then 'welding' when 60 then 'other-60'
      when 75 then 'other-75' when 200 then 'high-temperature' else 'marine' end`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('cable_runs').dropColumn('route').dropColumn('cable_type').execute();
}
