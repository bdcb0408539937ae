import { getMigrations } from 'better-auth/db/migration';

import type { Db } from '@/db/client';
import { migrateToLatest } from '@/db/migrator';
import type { Auth } from './auth';

/** better-auth's tables first (ours refer to them), then the project's own Kysely migrations. Idempotent. */
export async function migrateAll(auth: Auth, db: Db): Promise<string[]> {
  const { runMigrations, toBeCreated, toBeAdded } = await getMigrations(auth.options);
  const authChanges = [...toBeCreated.map((t) => `auth:${t.table}`), ...toBeAdded.map((t) => `auth:${t.table}+`)];
  if (authChanges.length) await runMigrations();
  return [...authChanges, ...(await migrateToLatest(db))];
}
