// `npm run db:seed`: the demo scenario of PRODUCT.md. Keyed by seed_key, so running it twice duplicates nothing.
import { createDb, type Db } from './client';
import { migrateToLatest } from './migrator';
import { DEMO_HOUSEHOLD, STOAT, WREN } from '@/shared/demo/scenario';
import { loadSchema, type ProjectionInputRaw } from '@/shared/schemas/projection';

const rigs: { seedKey: string; name: string; vehicle: string; input: ProjectionInputRaw }[] = [
  { seedKey: 'demo-wren', name: 'Wren', vehicle: '2011 long-wheelbase panel van', input: WREN },
  { seedKey: 'demo-stoat', name: 'Stoat', vehicle: 'Small hatchback', input: STOAT },
];

export async function seedDemo(db: Db) {
  await db.transaction().execute(async (trx) => {
    const household = await trx
      .insertInto('households')
      .values({ name: DEMO_HOUSEHOLD.name, seed_key: DEMO_HOUSEHOLD.seedKey })
      .onConflict((oc) => oc.column('seed_key').doUpdateSet({ name: DEMO_HOUSEHOLD.name }))
      .returning('id')
      .executeTakeFirstOrThrow();
    for (const rig of rigs) {
      const { loads = [], ...power } = rig.input;
      const row = await trx
        .insertInto('rigs')
        .values({ household_id: household.id, name: rig.name, vehicle: rig.vehicle, power: JSON.stringify(power), seed_key: rig.seedKey })
        .onConflict((oc) => oc.column('seed_key').doUpdateSet({ name: rig.name, vehicle: rig.vehicle, power: JSON.stringify(power) }))
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx.deleteFrom('loads').where('rig_id', '=', row.id).execute();
      const values = loads.map((raw, position) => {
        const l = loadSchema.parse(raw);
        return {
          rig_id: row.id,
          name: l.name,
          supply: l.supply,
          watts: l.watts ?? null,
          amps: l.amps ?? null,
          duty_percent: l.dutyPercent,
          hours_per_day: l.hoursPerDay,
          start_hour: l.startHour ?? 0,
          when: l.when,
          status: l.status,
          quantity: l.quantity,
          position,
        };
      });
      if (values.length) await trx.insertInto('loads').values(values).execute();
    }
  });
}

async function main() {
  const db = createDb(process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff', 1);
  try {
    await migrateToLatest(db);
    await seedDemo(db);
    const counts = await db
      .selectFrom('rigs')
      .select((eb) => [eb.fn.countAll<number>().as('rigs')])
      .executeTakeFirst();
    console.log(`demo scenario seeded (${counts?.rigs} rigs in the database)`);
  } catch (err) {
    console.error('seeding failed:', err instanceof Error ? err.message : err);
    process.exitCode = 1;
  } finally {
    await db.destroy();
  }
}

if (require.main === module) void main();
