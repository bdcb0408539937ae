// `npm run db:migrate`: brings the database in DATABASE_URL to the latest migration.
import { createDb } from './client';
import { migrateToLatest } from './migrator';

const url = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff';
const db = createDb(url, 1);

async function main() {
try {
  const applied = await migrateToLatest(db);
  console.log(applied.length ? `migrated: ${applied.join(', ')}` : 'database already up to date');
} catch (err) {
  console.error('migration failed:', err instanceof Error ? err.message : err);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
}

void main();
