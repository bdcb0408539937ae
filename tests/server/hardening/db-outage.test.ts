import { execFileSync } from 'node:child_process';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { householdFixture } from '../helpers';
import { makeTestApp } from '../test-app';

// PostgreSQL (the project's own cluster, scripts/db.sh) is stopped in the middle of a run of writes and
// started again. While it is down the API answers 503, never 500; afterwards it answers again without a
// restart of its own, and every write it acknowledged is there.
let ctx: Awaited<ReturnType<typeof makeTestApp>>;
let fx: Awaited<ReturnType<typeof householdFixture>>;
const db = (cmd: 'start' | 'stop') => execFileSync('bash', ['scripts/db.sh', cmd], { stdio: 'ignore', timeout: 60_000 });

beforeAll(async () => {
  ctx = await makeTestApp();
  fx = await householdFixture(ctx);
});
afterAll(async () => {
  db('start');
  await ctx.jobs.stop().catch(() => undefined);
  await ctx.db.destroy();
});

describe('PostgreSQL restarted during a load of writes', () => {
  it('answers 503 while it is down, recovers by itself, and keeps every acknowledged write', async () => {
    const acknowledged: string[] = [];
    const statuses: number[] = [];
    const write = async (i: number) => {
      const res = await fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send({ name: `Outage load ${i}`, supply: 'dc', watts: 1, hoursPerDay: 1 });
      statuses.push(res.status);
      if (res.status === 201) acknowledged.push(res.body.id);
      return res.status;
    };
    for (let i = 0; i < 10; i++) expect(await write(i)).toBe(201);

    db('stop');
    const during: number[] = [];
    for (let i = 10; i < 15; i++) during.push(await write(i));
    expect(during.every((s) => s === 503), `answers while down: ${during.join(', ')}`).toBe(true);
    const health = await fx.agents.member.get('/api/health');
    expect(health.status).toBe(503);

    db('start');
    let back = 0;
    for (let i = 15; i < 40 && back < 10; i++) if ((await write(i)) === 201) back += 1;
    expect(back).toBe(10);
    expect(statuses.some((s) => s >= 500 && s !== 503)).toBe(false);

    const stored = await ctx.db.selectFrom('loads').select('id').where('id', 'in', acknowledged).execute();
    expect(stored.length).toBe(acknowledged.length);
    expect((await fx.agents.member.get('/api/health')).status).toBe(200);
  }, 120_000);
});
