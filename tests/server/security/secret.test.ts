import { spawn } from 'node:child_process';
import { mkdtempSync, readFileSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { unsubscribeToken } from '@/server/emails/unsubscribe';
import { DEFAULT_AUTH_SECRET, localAuthSecret } from '@/server/security/secrets';
import { withTestApp } from '../fixtures';
import { agentFor, verifiedUser } from '../helpers';
import { makeTestApp } from '../test-app';

/** Runs a command to its end: exit code and everything it printed. */
function run(cmd: string, args: string[], env: Record<string, string>) {
  return new Promise<{ code: number | null; out: string }>((resolve) => {
    const child = spawn(cmd, args, { env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (out += d));
    child.on('exit', (code) => resolve({ code, out }));
  });
}

const secret = localAuthSecret(join(mkdtempSync(join(tmpdir(), 'keyoff-secret-')), 'auth-secret'));
const ctx = withTestApp({ env: { AUTH_SECRET: secret } });

describe('our own secret (issue 15, item 1)', () => {
  it('makes a random secret on first run in a file only its owner can read, and keeps it', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'keyoff-secret-'));
    const file = join(dir, '.data', 'auth-secret');
    // The same command npm start runs (scripts/lib.sh ensure_auth_secret).
    const first = await run('node_modules/.bin/tsx', ['scripts/auth-secret.ts', file], {});
    expect(first.code).toBe(0);
    expect(first.out.length).toBeGreaterThanOrEqual(64);
    expect(statSync(file).mode & 0o777).toBe(0o600);
    expect(readFileSync(file, 'utf8').trim()).toBe(first.out);
    expect(localAuthSecret(file)).toBe(first.out);
    expect(localAuthSecret(join(dir, 'another'))).not.toBe(first.out);
  });

  it('refuses to start in production with the repository default or a short secret', async () => {
    const env = { NODE_ENV: 'production', PORT: '8139', LOG_LEVEL: 'silent' };
    const withDefault = await run('node_modules/.bin/tsx', ['server/index.ts'], { ...env, AUTH_SECRET: DEFAULT_AUTH_SECRET });
    expect(withDefault.code).toBe(1);
    expect(withDefault.out).toMatch(/AUTH_SECRET: production refuses the repository default/);
    const short = await run('node_modules/.bin/tsx', ['server/index.ts'], { ...env, AUTH_SECRET: 'too-short-a-secret' });
    expect(short.code).toBe(1);
    expect(short.out).toMatch(/AUTH_SECRET/);
  }, 60_000);

  it('signs with its own secret: a session or a link made with the default secret is worthless here', async () => {
    const user = await verifiedUser(ctx, 'own-secret');
    // Tokens signed with the default secret (what anyone with the repository could make) are refused.
    const forged = unsubscribeToken(DEFAULT_AUTH_SECRET, user.id, 'warnings');
    const refused = await request(ctx.app).get(`/api/email/unsubscribe?token=${forged}`).expect(400);
    expect(refused.body.fields[0].path).toBe('token');
    // A session cookie from a server on the default secret does not open this one.
    const other = await makeTestApp();
    const elsewhere = await agentFor(other.app).post('/api/auth/sign-in/email').send({ email: user.email, password: 'a-long-test-password' }).expect(200);
    const cookie = (elsewhere.headers['set-cookie'] as unknown as string[]).map((c) => c.split(';')[0]).join('; ');
    await request(other.app).get('/api/me').set('Cookie', cookie).expect(200);
    await request(ctx.app).get('/api/me').set('Cookie', cookie).expect(401);
    await other.db.destroy();
    // The link key is derived from the secret (HKDF with a label), never the secret itself nor the old "secret:label".
    const own = unsubscribeToken(secret, user.id, 'warnings');
    await request(ctx.app).get(`/api/email/unsubscribe?token=${own}`).expect(200);
    expect((await ctx.db.selectFrom('email_prefs').select('warnings_on').where('user_id', '=', user.id).executeTakeFirstOrThrow()).warnings_on).toBe(false);
  });
});
