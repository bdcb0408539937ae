import { pino } from 'pino';

import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { type AppContext, createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';

export const TEST_DATABASE_URL = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_test';
export const TEST_ORIGIN = 'http://127.0.0.1:8080';

/** The real app on the real test database (npm test empties, migrates and seeds it) and real SMTP (maildev). */
export async function makeTestApp(env: Record<string, string> = {}) {
  const config = loadConfig({ ...process.env, NODE_ENV: 'test', DATABASE_URL: TEST_DATABASE_URL, SERVE_WEB: 'false', KEYOFF_URL: TEST_ORIGIN, SIGN_IN_LIMIT_PER_MINUTE: '10000', ...env });
  const ctx: AppContext = createContext(process.env, { config, logger: pino({ level: 'silent' }) });
  await migrateAll(ctx.auth, ctx.db);
  const app = createApp(ctx);
  return { ...ctx, app };
}
