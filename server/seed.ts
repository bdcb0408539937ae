// The demo scenario of PRODUCT.md, seeded by `npm run db:seed` (scripts/seed.ts): its people (who sign in
// with DEMO_PASSWORD), the Halloran-Okafor household and the rigs Wren and Stoat. Keyed by e-mail, slug and
// seed_key, so running it twice duplicates nothing.
import { DEMO_HOUSEHOLD, DEMO_PASSWORD, DEMO_PEOPLE, type DemoPersonKey, STOAT, WREN, WREN_ADDED_BY } from '@/shared/demo/scenario';
import { loadSchema, type ProjectionInputRaw } from '@/shared/schemas/projection';
import type { AppContext } from './context';
import { loadToRow } from './services/rigs-model';

const rigs: { seedKey: string; name: string; vehicle: string; input: ProjectionInputRaw }[] = [
  { seedKey: 'demo-wren', name: 'Wren', vehicle: '2011 long-wheelbase panel van', input: WREN },
  { seedKey: 'demo-stoat', name: 'Stoat', vehicle: 'Small hatchback', input: STOAT },
];

export async function seedDemo({ db, auth }: Pick<AppContext, 'db' | 'auth'>) {
  const ids = {} as Record<DemoPersonKey, string>;
  for (const person of DEMO_PEOPLE) {
    let user = await db.selectFrom('user').select('id').where('email', '=', person.email).executeTakeFirst();
    if (!user) {
      const created = await auth.api.signUpEmail({ body: { name: person.name, email: person.email, password: DEMO_PASSWORD } });
      user = { id: created.user.id };
    }
    // Demo accounts start verified, with their account role.
    await db.updateTable('user').set({ emailVerified: true, role: person.accountRole }).where('id', '=', user.id).execute();
    ids[person.key] = user.id;
  }

  let household = await db.selectFrom('organization').select('id').where('slug', '=', DEMO_HOUSEHOLD.slug).executeTakeFirst();
  if (!household) {
    const created = await auth.api.createOrganization({ body: { name: DEMO_HOUSEHOLD.name, slug: DEMO_HOUSEHOLD.slug, userId: ids.ines } });
    household = { id: created!.id };
  }
  for (const person of DEMO_PEOPLE) {
    if (!person.householdRole) continue;
    const member = await db.selectFrom('member').select('id').where('organizationId', '=', household.id).where('userId', '=', ids[person.key]).executeTakeFirst();
    if (!member) await auth.api.addMember({ body: { userId: ids[person.key], role: person.householdRole, organizationId: household.id } });
  }

  await db.transaction().execute(async (trx) => {
    for (const rig of rigs) {
      const { loads = [], ...power } = rig.input;
      const row = await trx
        .insertInto('rigs')
        .values({ household_id: household.id, created_by: ids.ines, name: rig.name, vehicle: rig.vehicle, power: JSON.stringify(power), seed_key: rig.seedKey })
        .onConflict((oc) => oc.column('seed_key').doUpdateSet({ household_id: household.id, name: rig.name, vehicle: rig.vehicle, power: JSON.stringify(power) }))
        .returning('id')
        .executeTakeFirstOrThrow();
      await trx.deleteFrom('loads').where('rig_id', '=', row.id).execute();
      const values = loads.map((raw, i) => {
        const load = loadSchema.parse(raw);
        return { ...loadToRow(load, i, ids[(rig.name === 'Wren' && WREN_ADDED_BY[load.name]) || 'ines']), rig_id: row.id };
      });
      if (values.length) await trx.insertInto('loads').values(values).execute();
    }
  });
  return { household: household.id, people: ids };
}
