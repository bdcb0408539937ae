import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withTestApp } from './fixtures';
import { agentFor, latestMailTo, linkIn, PASSWORD, signIn, uniqueEmail } from './helpers';
import { makeTestApp, TEST_ORIGIN } from './test-app';

// Workers on: the password reset e-mail goes out from the job queue.
const ctx = withTestApp({ workers: true });

const post = (agent: ReturnType<typeof agentFor>, path: string, body: object) => agent.post(path).send(body);

describe('sign-up, verification, sign-in and sign-out over HTTP, with mail through maildev', () => {
  it('signs up, follows the verification link from the e-mail, reaches a protected route, signs out', async () => {
    const email = uniqueEmail('newcomer');
    const agent = agentFor(ctx.app);
    await post(agent, '/api/auth/sign-up/email', { name: 'Newcomer', email, password: PASSWORD, callbackURL: '/' }).expect(200);

    // Not verified yet: no sign-in.
    const early = await post(agentFor(ctx.app), '/api/auth/sign-in/email', { email, password: PASSWORD });
    expect(early.status).toBe(403);

    const mail = await latestMailTo(email);
    expect(mail.subject).toBe('Confirm your e-mail address for Keyoff');
    expect(mail.html).toContain('Keyoff');
    const link = linkIn(mail);
    expect(link.pathname).toBe('/api/auth/verify-email');
    const verified = await agent.get(link.pathname + link.search);
    expect([200, 302]).toContain(verified.status);

    const me = await agent.get('/api/me').expect(200);
    expect(me.body.user).toMatchObject({ email, role: 'traveller' });

    await post(agent, '/api/auth/sign-out', {}).expect(200);
    await agent.get('/api/me').expect(401);

    const again = await signIn(ctx.app, email);
    await again.get('/api/me').expect(200);
  });

  it('resets a forgotten password through the e-mailed link, once', async () => {
    const email = uniqueEmail('forgetful');
    const agent = agentFor(ctx.app);
    await post(agent, '/api/auth/sign-up/email', { name: 'Forgetful', email, password: PASSWORD }).expect(200);
    await agent.get(linkIn(await latestMailTo(email)).pathname + linkIn(await latestMailTo(email)).search);

    await post(agentFor(ctx.app), '/api/auth/request-password-reset', { email, redirectTo: `${TEST_ORIGIN}/reset-password` }).expect(200);
    const mail = await latestMailTo(email, /Reset/, 30_000);
    expect(mail.subject).toBe('Reset your Keyoff password');
    const link = linkIn(mail);
    const redirect = await request(ctx.app).get(link.pathname + link.search).expect(302);
    const token = new URL(redirect.headers.location).searchParams.get('token');
    expect(token).toBeTruthy();

    const newPassword = 'another-long-password';
    await post(agentFor(ctx.app), '/api/auth/reset-password', { newPassword, token }).expect(200);
    await signIn(ctx.app, email, newPassword);
    const old = await post(agentFor(ctx.app), '/api/auth/sign-in/email', { email, password: PASSWORD });
    expect(old.status).toBe(401);
    const reuse = await post(agentFor(ctx.app), '/api/auth/reset-password', { newPassword: 'yet-another-password', token });
    expect(reuse.status).toBe(400);
  });

  it('answers a wrong password and an unknown address alike', async () => {
    const wrong = await post(agentFor(ctx.app), '/api/auth/sign-in/email', { email: 'ines@example.org', password: 'not-the-password' });
    const unknown = await post(agentFor(ctx.app), '/api/auth/sign-in/email', { email: uniqueEmail('nobody'), password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.message).toBe(unknown.body.message);
  });

  it('refuses a request from a foreign origin', async () => {
    const res = await agentFor(ctx.app).post('/api/auth/sign-in/email').set('Origin', 'http://evil.example.org').send({ email: 'ines@example.org', password: 'keyoff-demo-2026' });
    expect(res.status).toBe(403);
  });
});

describe('bad input at sign-up creates nothing', () => {
  const count = async (email: string) => Number((await ctx.db.selectFrom('user').select((eb) => eb.fn.countAll<string>().as('n')).where('email', '=', email).executeTakeFirst())?.n);

  it('refuses a malformed e-mail and a short password with 400', async () => {
    const bad = await post(agentFor(ctx.app), '/api/auth/sign-up/email', { name: 'X', email: 'not-an-address', password: PASSWORD });
    expect(bad.status).toBe(400);
    const email = uniqueEmail('short');
    const short = await post(agentFor(ctx.app), '/api/auth/sign-up/email', { name: 'X', email, password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.message).toMatch(/short/i);
    expect(await count(email)).toBe(0);
  });

  it('refuses an oversized body and unknown fields on our own routes, naming the field', async () => {
    const agent = await signIn(ctx.app, 'ines@example.org', 'keyoff-demo-2026');
    const big = await agent.post('/api/rigs').send({ name: 'x'.repeat(2_000_000) });
    expect(big.status).toBe(413);
    const extra = await agent.post('/api/rigs').send({ name: 'Van', power: { battery: { chemistry: 'agm', capacityAh: 100 } }, colour: 'red' });
    expect(extra.status).toBe(400);
    expect(extra.body.fields.map((f: { path: string }) => f.path)).toContain('colour');
    expect(extra.body.fields[0].message).toMatch(/colour/);
  });
});

describe('account roles', () => {
  it('lets an admin change an account role, and nobody else', async () => {
    const admin = await signIn(ctx.app, 'admin@example.org', 'keyoff-demo-2026');
    const dara = await ctx.db.selectFrom('user').select('id').where('email', '=', 'dara@example.org').executeTakeFirstOrThrow();
    await admin.put(`/api/admin/users/${dara.id}/role`).send({ role: 'advisor' }).expect(204);
    expect((await ctx.db.selectFrom('user').select('role').where('id', '=', dara.id).executeTakeFirstOrThrow()).role).toBe('advisor');
    await admin.put(`/api/admin/users/${dara.id}/role`).send({ role: 'traveller' }).expect(204);
    const bad = await admin.put(`/api/admin/users/${dara.id}/role`).send({ role: 'emperor' }).expect(400);
    expect(bad.body.fields[0].path).toBe('role');
    const ines = await signIn(ctx.app, 'ines@example.org', 'keyoff-demo-2026');
    await ines.put(`/api/admin/users/${dara.id}/role`).send({ role: 'admin' }).expect(403);
  });

  it('makes the configured first admin an admin at sign-up', async () => {
    const email = uniqueEmail('boss');
    const withAdmin = await makeTestApp({ ADMIN_EMAILS: email });
    await agentFor(withAdmin.app).post('/api/auth/sign-up/email').send({ name: 'Boss', email, password: PASSWORD }).expect(200);
    expect((await withAdmin.db.selectFrom('user').select('role').where('email', '=', email).executeTakeFirstOrThrow()).role).toBe('admin');
    await withAdmin.db.destroy();
  });
});
