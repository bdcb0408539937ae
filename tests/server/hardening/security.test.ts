import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { withTestApp } from '../fixtures';
import { agentFor, latestMailTo, linkIn, PASSWORD, signIn, verifiedUser, WREN_POWER } from '../helpers';
import { TEST_ORIGIN } from '../test-app';

// Workers on: the password reset e-mail goes out from the job queue.
const ctx = withTestApp({ workers: true });

const newRig = { name: 'Security van', power: WREN_POWER };

describe('security', () => {
  it('refuses writes a browser sends from another site, on our routes as on the auth routes', async () => {
    const user = await verifiedUser(ctx, 'origin');
    const agent = await signIn(ctx.app, user.email);
    const res = await agent.post('/api/rigs').set('Origin', 'https://evil.example').send(newRig).expect(403);
    expect(res.body.fields[0].path).toBe('Origin');
    await agent.post('/api/rigs').send(newRig).expect(201);
    await request(ctx.app).post('/api/auth/sign-in/email').set('Origin', 'https://evil.example').send({ email: user.email, password: PASSWORD }).expect(403);
  });

  it('sets the session cookie HttpOnly and SameSite=Lax', async () => {
    const user = await verifiedUser(ctx, 'cookie');
    const res = await agentFor(ctx.app).post('/api/auth/sign-in/email').send({ email: user.email, password: PASSWORD }).expect(200);
    const session = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.includes('session_token'))!;
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
  });

  it('revokes other sessions on a password change and every session on a reset: they can change nothing after', async () => {
    const user = await verifiedUser(ctx, 'revoke');
    const laptop = await signIn(ctx.app, user.email);
    const phone = await signIn(ctx.app, user.email);
    await laptop.post('/api/rigs').send(newRig).expect(201);
    await laptop.post('/api/auth/change-password').send({ currentPassword: PASSWORD, newPassword: 'a-changed-password-1', revokeOtherSessions: true }).expect(200);
    await phone.post('/api/rigs').send(newRig).expect(401);

    const tablet = await signIn(ctx.app, user.email, 'a-changed-password-1');
    await agentFor(ctx.app).post('/api/auth/request-password-reset').send({ email: user.email, redirectTo: `${TEST_ORIGIN}/reset-password` }).expect(200);
    const link = linkIn(await latestMailTo(user.email, /Reset/, 30_000));
    const token = new URL((await request(ctx.app).get(link.pathname + link.search).expect(302)).headers.location).searchParams.get('token');
    await agentFor(ctx.app).post('/api/auth/reset-password').send({ newPassword: 'a-reset-password-22', token }).expect(200);
    await tablet.post('/api/rigs').send(newRig).expect(401);
    // The token worked once.
    await agentFor(ctx.app).post('/api/auth/reset-password').send({ newPassword: 'a-third-password-333', token }).expect(400);
  });

  it('keeps no secrets in the repository', () => {
    const files = execFileSync('git', ['ls-files'], { encoding: 'utf8' }).split('\n').filter(Boolean);
    expect(files.filter((f) => /(^|\/)\.env($|\.)|\.pem$|\.key$|id_rsa/.test(f))).toEqual([]);
    const patterns = [/-----BEGIN [A-Z ]*PRIVATE KEY-----/, /AKIA[0-9A-Z]{16}/, /xox[baprs]-[0-9A-Za-z-]{10,}/, /ghp_[0-9A-Za-z]{36}/];
    const hits = files
      .filter((f) => !/\.(png|jpg|ttf|wasm|ico)$/.test(f) && f !== 'package-lock.json')
      .flatMap((f) => {
        let text = '';
        try {
          text = readFileSync(f, 'utf8');
        } catch {
          return [];
        }
        return patterns.filter((p) => p.test(text)).map((p) => `${f}: ${p}`);
      });
    expect(hits).toEqual([]);
  });
});
