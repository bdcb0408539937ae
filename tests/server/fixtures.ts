import { afterAll, beforeAll } from 'vitest';

import type { AppContext } from '@/server/context';
import { householdFixture } from './helpers';
import { closeTestApp, makeTestApp } from './test-app';

export type TestApp = Awaited<ReturnType<typeof makeTestApp>>;
export type Household = Awaited<ReturnType<typeof householdFixture>> & {
  /** The demo scenario's rigs as `npm run db:seed` left them (Ines's household). */
  seeded: { wren: string; stoat: string };
};

export type TestAppOptions = {
  /** Configuration on top of makeTestApp's (for example RATE_LIMIT_PER_MINUTE). */
  env?: Record<string, string>;
  overrides?: Partial<Pick<AppContext, 'clock' | 'mailer'>>;
  /** Run the job workers (RUN_WORKERS: makeTestApp starts them); without it jobs are queued and never run. */
  workers?: boolean;
};

/**
 * The real app on the test database for one test file: made in `beforeAll`, its queue stopped and its
 * database pool closed in `afterAll`. The object returned is filled in before the first test runs, so
 * use it inside tests and hooks only:
 *
 *     const ctx = withTestApp();
 *     it('...', async () => { await agentFor(ctx.app).get('/api/health').expect(200); });
 */
export function withTestApp(options: TestAppOptions = {}): TestApp {
  const ctx = {} as TestApp;
  beforeAll(async () => {
    const env = options.workers ? { RUN_WORKERS: 'true', ...options.env } : options.env;
    Object.assign(ctx, await makeTestApp(env, options.overrides));
  });
  afterAll(async () => {
    if (!ctx.db) return; // makeTestApp failed: its error is the one to read
    await closeTestApp(ctx);
  });
  return ctx;
}

/**
 * withTestApp plus a household of its own: an owner, a member and an advisor of one rig ("Fixture van"),
 * an outsider and an admin, each with a signed-in agent (`fx.agents.owner` …) that sends our Origin, and
 * the ids of the seeded demo rigs (`fx.seeded.wren`).
 *
 *     const { ctx, fx } = withHousehold();
 */
export function withHousehold(options: TestAppOptions = {}): { ctx: TestApp; fx: Household } {
  const ctx = withTestApp(options);
  const fx = {} as Household;
  beforeAll(async () => {
    const seed = await ctx.db.selectFrom('rigs').select(['id', 'seed_key']).where('seed_key', 'in', ['demo-wren', 'demo-stoat']).execute();
    const idOf = (key: string) => {
      const row = seed.find((r) => r.seed_key === key);
      if (!row) throw new Error(`the seeded rig ${key} is missing: run db/seed-cli.ts on the test database`);
      return row.id;
    };
    Object.assign(fx, await householdFixture(ctx), { seeded: { wren: idOf('demo-wren'), stoat: idOf('demo-stoat') } });
  });
  return { ctx, fx };
}
