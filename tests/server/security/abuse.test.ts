import { sql } from 'kysely';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { QUEUES } from '@/server/jobs/types';
import { withHousehold } from '../fixtures';
import { agentFor, latestMailTo, signIn, uniqueEmail, verifiedUser } from '../helpers';
import { mailsTo, waitFor } from '../jobs/helpers';
import { makeTestApp, TEST_ORIGIN } from '../test-app';

const { ctx, fx } = withHousehold({ env: { INVITES_PER_INVITER_PER_HOUR: '3', INVITES_PER_HOUSEHOLD_PER_DAY: '5', RATE_LIMIT_PER_MINUTE: '4' } });

describe('invitations and names are bounded (issue 15, item 4)', () => {
  it('caps names at 80 characters on better-auth’s routes, naming the field', async () => {
    const long = 'N'.repeat(100_000);
    const signUp = await agentFor(ctx.app).post('/api/auth/sign-up/email').send({ name: long, email: uniqueEmail('long'), password: 'a-long-test-password' });
    expect(signUp.status).toBe(400);
    expect(signUp.body.message).toMatch(/^name: use at most 80 characters/);
    const rename = await fx.agents.member.post('/api/auth/update-user').send({ name: 'N'.repeat(81) });
    expect(rename.status).toBe(400);
    await fx.agents.member.post('/api/auth/update-user').send({ name: 'N'.repeat(80) }).expect(200);
    // In the server too (the household a rig makes is named from the rig's name, itself at most 60).
    await expect(ctx.auth.api.createOrganization({ body: { name: 'H'.repeat(81), slug: `long-${Date.now()}`, userId: fx.users.owner.id } })).rejects.toThrow(/at most 80/);
  });

  it('limits invitation e-mails per inviter (an hour) and per household (a day): 429 with the time to wait', async () => {
    const invite = (agent: typeof fx.agents.owner) => agent.post(`/api/rigs/${fx.rigId}/invitations`).send({ email: uniqueEmail('invitee'), role: 'member' });
    const statuses: number[] = [];
    let last: request.Response | null = null;
    for (let i = 0; i < 4; i++) statuses.push((last = await invite(fx.agents.owner)).status);
    expect(statuses).toEqual([201, 201, 201, 429]);
    expect(Number(last!.headers['retry-after'])).toBeGreaterThan(3500);
    expect(Number(last!.headers['retry-after'])).toBeLessThanOrEqual(3600);
    expect(last!.body).toMatchObject({ code: 'rate_limited', retryAfterSeconds: Number(last!.headers['retry-after']) });
    // A resend counts too.
    const pending = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/people`)).body.invitations[0].id;
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/invitations/${pending}/resend`).expect(429);

    // A second owner of the same household has an hour of their own, but the household's day runs out at 5.
    const coOwner = await verifiedUser(ctx, 'co-owner');
    await ctx.auth.api.addMember({ body: { userId: coOwner.id, role: 'owner', organizationId: fx.householdId } });
    const co = await signIn(ctx.app, coOwner.email);
    const second: number[] = [];
    for (let i = 0; i < 3; i++) second.push((last = await invite(co)).status);
    expect(second).toEqual([201, 201, 429]);
    expect(last!.body.message).toMatch(/household/);
    expect(Number(last!.headers['retry-after'])).toBeGreaterThan(86_000);
    // Five sends were counted in all.
    expect((await ctx.db.selectFrom('invitation_sends').select('id').where('household_id', '=', fx.householdId).execute()).length).toBe(5);
  });
});

describe('forgot-password answers alike for known and unknown addresses (issue 15, item 5)', () => {
  it('queues the e-mail instead of sending it in the request: the answer does not wait on SMTP', async () => {
    const known = await verifiedUser(ctx, 'forgot');
    const ask = (email: string) => agentFor(ctx.app).post('/api/auth/request-password-reset').send({ email, redirectTo: `${TEST_ORIGIN}/reset-password` });
    const timed = async (email: string) => {
      const started = performance.now();
      const res = await ask(email);
      return Object.assign(res, { ms: performance.now() - started });
    };
    const forKnown = await timed(known.email);
    const forUnknown = await timed(uniqueEmail('nobody'));
    // Neither answers before the floor (a lower bound the server sets, not a speed target).
    expect(Math.min(forKnown.ms, forUnknown.ms)).toBeGreaterThanOrEqual(ctx.config.RESET_ANSWER_MS - 5);
    expect([forKnown.status, forUnknown.status]).toEqual([200, 200]);
    expect(forKnown.body).toEqual(forUnknown.body);
    // This app runs no workers: the request put a job on the queue and sent nothing itself.
    expect((await mailsTo(known.email)).filter((m) => /Reset/.test(m.subject))).toHaveLength(0);
    const queued = await sql<{ n: number }>`select count(*)::int as n from ${sql.id(ctx.config.JOBS_SCHEMA, 'job')} where name = ${QUEUES.mailRetry}`.execute(ctx.db);
    expect(queued.rows[0].n).toBe(1);
    // A process with workers on the same queue sends it.
    const worker = await makeTestApp({ RUN_WORKERS: 'true', JOBS_SCHEMA: ctx.config.JOBS_SCHEMA });
    const mail = await waitFor(() => latestMailTo(known.email, /Reset/, 1000).catch(() => null), 60_000, 'the reset e-mail');
    expect(mail.subject).toBe('Reset your Keyoff password');
    await worker.jobs.stop();
    await worker.db.destroy();
  }, 120_000);
});

describe('the open routes share one budget per client (issue 15, item 11)', () => {
  it('counts the model, cable sizing, log analysis and unsubscribe routes together', async () => {
    const statuses = [
      (await request(ctx.app).post('/api/projections').send({ battery: { chemistry: 'agm', capacityAh: 100 } })).status,
      (await request(ctx.app).post('/api/cable-runs/size').send({ currentA: 10, lengthM: 2 })).status,
      (await request(ctx.app).post('/api/readings/analyze').send({ chemistry: 'agm', capacityAh: 100, readings: [{ at: '2026-11-20T18:00:00Z', voltageV: 12.6, rested: true }] })).status,
      (await request(ctx.app).get('/api/email/unsubscribe?token=not-a-real-token')).status,
      (await request(ctx.app).post('/api/projections/compare').send({})).status,
      (await request(ctx.app).post('/api/cable-runs/size').send({ currentA: 10, lengthM: 2 })).status,
    ];
    expect(statuses).toEqual([200, 200, 200, 400, 429, 429]);
  });
});
