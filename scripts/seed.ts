// `npm run db:seed`: migrates, then seeds the demo scenario into DATABASE_URL.
import { createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';
import { seedDemo } from '@/server/seed';

async function main() {
  // Demo accounts are created verified: no e-mail goes out while seeding.
  const ctx = createContext(process.env, { mailer: { send: async () => {} } });
  try {
    await migrateAll(ctx.auth, ctx.db);
    await seedDemo(ctx);
    const rigs = await ctx.db.selectFrom('rigs').select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirst();
    console.log(`demo scenario seeded (${rigs?.n} rigs in the database)`);
  } catch (err) {
    console.error('seeding failed:', err instanceof Error ? err.message : err);
    process.exitCode = 1;
  } finally {
    await ctx.db.destroy();
  }
}

void main();
