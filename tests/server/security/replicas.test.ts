import { type ChildProcess, spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { createServer } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { figuresOfRigs } from '@/server/jobs/figures';
import { reportKey, type ReportJob } from '@/server/jobs/reports';
import { QUEUES } from '@/server/jobs/types';
import { householdFixture, PASSWORD } from '../helpers';
import { mailsTo, waitFor } from '../jobs/helpers';
import { makeTestApp, TEST_DATABASE_URL, TEST_ORIGIN } from '../test-app';

// Two real server processes (tsx server/index.ts) on one PostgreSQL, one secret and one job schema:
// what a load balancer in front of several replicas would see.
const SECRET = randomBytes(48).toString('base64url');
const JOBS_SCHEMA = `pgboss_r${randomBytes(4).toString('hex')}`;

const freePort = () =>
  new Promise<number>((resolve) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });

type Replica = { url: string; child: ChildProcess; log: string[] };
async function startReplica(): Promise<Replica> {
  const port = await freePort();
  const child = spawn('node_modules/.bin/tsx', ['server/index.ts'], {
    env: { ...process.env, NODE_ENV: 'development', PORT: String(port), DATABASE_URL: TEST_DATABASE_URL, AUTH_SECRET: SECRET, JOBS_SCHEMA, RUN_WORKERS: 'true', JOB_POLL_SECONDS: '0.5', KEYOFF_URL: TEST_ORIGIN, SERVE_WEB: 'false', LOG_LEVEL: 'info', SIGN_IN_LIMIT_PER_MINUTE: '1000' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const log: string[] = [];
  child.stdout!.on('data', (d: Buffer) => log.push(...d.toString().split('\n').filter(Boolean)));
  const url = `http://127.0.0.1:${port}`;
  await waitFor(() => fetch(`${url}/api/health`).then((r) => r.ok).catch(() => false), 60_000, `the replica on ${port}`);
  return { url, child, log };
}
const stop = (r: Replica) => new Promise<void>((resolve) => (r.child.exitCode !== null ? resolve() : (r.child.once('exit', () => resolve()), r.child.kill('SIGTERM'))));

let ctx: Awaited<ReturnType<typeof makeTestApp>>;
let fx: Awaited<ReturnType<typeof householdFixture>>;
let a: Replica;
let b: Replica;
beforeAll(async () => {
  // This process only sets up accounts and queues jobs; it runs no workers.
  ctx = await makeTestApp({ AUTH_SECRET: SECRET, JOBS_SCHEMA });
  fx = await householdFixture(ctx);
  [a, b] = await Promise.all([startReplica(), startReplica()]);
}, 120_000);
afterAll(async () => {
  await Promise.all([a, b].filter(Boolean).map(stop));
  await ctx.jobs.stop();
  await ctx.db.destroy();
});

const send = (base: string, path: string, init: RequestInit & { cookie?: string } = {}) =>
  fetch(`${base}${path}`, { ...init, headers: { 'Content-Type': 'application/json', Origin: TEST_ORIGIN, ...(init.cookie ? { Cookie: init.cookie } : {}) } });

describe('several server processes on one database (issue 15, item 12)', () => {
  it('takes a session made on one on the other, and a sign-out on one shuts it out on the other within seconds', async () => {
    const signedIn = await send(a.url, '/api/auth/sign-in/email', { method: 'POST', body: JSON.stringify({ email: fx.users.member.email, password: PASSWORD }) });
    expect(signedIn.status).toBe(200);
    const cookie = signedIn.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
    expect((await send(b.url, '/api/me', { cookie })).status).toBe(200);
    expect((await send(b.url, `/api/rigs/${fx.rigId}`, { cookie })).status).toBe(200);
    expect((await send(a.url, '/api/auth/sign-out', { method: 'POST', cookie, body: '{}' })).status).toBe(200);
    expect((await send(a.url, '/api/me', { cookie })).status).toBe(401);
    // B kept the look-up for at most its read cache's five seconds.
    await waitFor(async () => (await send(b.url, '/api/me', { cookie })).status === 401, 8_000, 'the sign-out to reach the other process');
  }, 30_000);

  it('serves an Outlook changed through one process fresh from the other', async () => {
    const cookie = (await send(a.url, '/api/auth/sign-in/email', { method: 'POST', body: JSON.stringify({ email: fx.users.owner.email, password: PASSWORD }) })).headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
    const before = await (await send(b.url, `/api/rigs/${fx.rigId}/outlook`, { cookie })).json();
    const rig = await (await send(a.url, `/api/rigs/${fx.rigId}`, { cookie })).json();
    const bigger = { ...rig.power, battery: { ...rig.power.battery, capacityAh: 200 } };
    expect((await send(a.url, `/api/rigs/${fx.rigId}`, { method: 'PATCH', cookie, body: JSON.stringify({ version: rig.version, power: bigger }) })).status).toBe(200);
    const after = await (await send(b.url, `/api/rigs/${fx.rigId}/outlook`, { cookie })).json();
    expect(after.version).toBe(before.version + 1);
    expect(after.parked.daysToCutoff ?? Infinity).toBeGreaterThan(before.parked.daysToCutoff);
  }, 30_000);

  it('shares a batch of report jobs between the processes and sends each e-mail once, duplicates included', async () => {
    const rig = await ctx.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', fx.rigId).executeTakeFirstOrThrow();
    const figures = (await figuresOfRigs(ctx.db, [rig])).get(fx.rigId)!;
    const people = [fx.users.owner, fx.users.member, fx.users.advisor];
    const weeks = Array.from({ length: 10 }, (_, i) => `replicas-${Date.now()}-${i}`);
    const jobs = people.flatMap((p) => weeks.map((weekKey): ReportJob => ({ userId: p.id, rigId: fx.rigId, weekKey, scheduledFor: new Date().toISOString(), figures })));
    // Every job twice, as a retried tick or a second scheduler might queue it.
    await ctx.jobs.boss.insert([...jobs, ...jobs].map((data) => ({ name: QUEUES.reportSend, data })));

    const keys = jobs.map((j) => reportKey(j.userId, j.rigId, j.weekKey));
    const sent = await waitFor(
      async () => {
        const rows = await ctx.db.selectFrom('email_log').select('idempotency_key').where('idempotency_key', 'in', keys).where('status', '=', 'sent').execute();
        return rows.length === keys.length && rows;
      },
      60_000,
      'every report to be sent',
    );
    expect(sent).toHaveLength(30);
    for (const p of people) {
      const mine = (await mailsTo(p.email)).filter((m) => weeks.some((w) => m.text.includes(w)));
      const perWeek = weeks.map((w) => mine.filter((m) => m.text.includes(`week of ${w}`)).length);
      expect([p.email, perWeek]).toEqual([p.email, weeks.map(() => 1)]);
    }
    // Both processes took part: each logged some of the sends.
    const sends = [a, b].map((r) => r.log.filter((l) => /"msg":"mail sent"/.test(l) && /parked, margin/.test(l)).length);
    console.info(`report e-mails sent by each process: ${sends.join(' and ')}`);
    expect(sends[0] + sends[1]).toBe(30);
    expect(Math.min(...sends)).toBeGreaterThan(0);
  }, 90_000);
});
