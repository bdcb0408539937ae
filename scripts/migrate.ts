// `npm run db:migrate`: better-auth's tables, then the project's migrations, in DATABASE_URL.
import { createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';

async function main() {
  const ctx = createContext();
  try {
    const applied = await migrateAll(ctx.auth, ctx.db);
    console.log(applied.length ? `migrated: ${applied.join(', ')}` : 'database already up to date');
  } catch (err) {
    console.error('migration failed:', err instanceof Error ? err.message : err);
    process.exitCode = 1;
  } finally {
    await ctx.db.destroy();
  }
}

void main();
