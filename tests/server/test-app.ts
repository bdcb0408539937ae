import { sql } from 'kysely';
import { pino } from 'pino';

import { createApp } from '@/server/app';
import { loadConfig } from '@/server/config';
import { type AppContext, createContext } from '@/server/context';
import { migrateAll } from '@/server/migrate';

export const TEST_DATABASE_URL = process.env.DATABASE_URL ?? 'postgres://keyoff@127.0.0.1:54329/keyoff_test';
export const TEST_ORIGIN = 'http://127.0.0.1:8080';

/**
 * The real app on the real test database (npm test empties, migrates and seeds it), real SMTP (maildev)
 * and a real pg-boss queue in a schema of its own, so that one test's jobs never reach another's
 * workers. Workers run only where a test asks for them (RUN_WORKERS: 'true'); `clock` sets the time.
 */
export async function makeTestApp(env: Record<string, string> = {}, overrides: Partial<Pick<AppContext, 'clock' | 'mailer'>> = {}) {
  const config = loadConfig({
    ...process.env,
    NODE_ENV: 'test',
    DATABASE_URL: TEST_DATABASE_URL,
    SERVE_WEB: 'false',
    KEYOFF_URL: TEST_ORIGIN,
    SIGN_IN_LIMIT_PER_MINUTE: '10000',
    INVITES_PER_INVITER_PER_HOUR: '10000',
    INVITES_PER_HOUSEHOLD_PER_DAY: '10000',
    JOBS_SCHEMA: `pgboss_t${Math.random().toString(36).slice(2, 10)}`,
    RUN_WORKERS: 'false',
    JOB_POLL_SECONDS: '0.5',
    JOB_RETRY_DELAY_SECONDS: '1',
    ...env,
  });
  const ctx: AppContext = createContext(process.env, { config, logger: pino({ level: 'silent' }), ...overrides });
  await migrateAll(ctx.auth, ctx.db);
  await ctx.jobs.start();
  const app = createApp(ctx);
  return { ...ctx, app };
}

/**
 * Stops a test app's queue, drops the queue's own schema (one per app; npm test also empties them all at its
 * start, so a drop that has to wait on a lock is given up after two seconds) and closes its database pool.
 */
export async function closeTestApp(ctx: Pick<AppContext, 'jobs' | 'db' | 'config'>) {
  await ctx.jobs.stop();
  await ctx.db
    .transaction()
    .execute(async (trx) => {
      await sql`set local lock_timeout = '2s'`.execute(trx);
      await sql`drop schema if exists ${sql.id(ctx.config.JOBS_SCHEMA)} cascade`.execute(trx);
    })
    .catch(() => undefined);
  await ctx.db.destroy();
}
