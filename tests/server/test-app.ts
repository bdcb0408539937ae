import { pino } from 'pino';

import { createDb, type Db } from '@/db/client';
import { migrateToLatest } from '@/db/migrator';
import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';

/** The real app on the real test database (npm test creates and migrates it). */
export async function makeTestApp(env: Record<string, string> = {}) {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    DATABASE_URL: process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_test',
    SERVE_WEB: 'false',
    ...env,
  });
  const db: Db = createDb(config.DATABASE_URL, 4);
  await migrateToLatest(db);
  const app = createApp({ config, db, logger: pino({ level: 'silent' }) });
  return { app, db, config };
}
