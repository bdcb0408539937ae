import { type ChildProcess, spawn } from 'node:child_process';
import { resolve } from 'node:path';

import { localAuthSecret } from '../../server/security/secrets';

// Starts the production server (API plus the exported web build) on its own port for the browser tests.
// E2E_PORT lets two checkouts run their browser tests side by side.
export const E2E_PORT = Number(process.env.E2E_PORT ?? 8091);
let server: ChildProcess | undefined;

export async function setup() {
  server = spawn('node_modules/.bin/tsx', ['server/index.ts'], {
    // Production mode refuses the default secret: the same local secret as npm start (made on a fresh clone).
    env: { ...process.env, AUTH_SECRET: process.env.AUTH_SECRET ?? localAuthSecret(resolve('.data/auth-secret')), NODE_ENV: 'production', PORT: String(E2E_PORT), LOG_LEVEL: 'warn', KEYOFF_URL: `http://127.0.0.1:${E2E_PORT}`, SIGN_IN_LIMIT_PER_MINUTE: '1000', INVITES_PER_INVITER_PER_HOUR: '1000', INVITES_PER_HOUSEHOLD_PER_DAY: '1000' },
    stdio: ['ignore', 'inherit', 'inherit'],
  });
  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const res = await fetch(`http://127.0.0.1:${E2E_PORT}/api/health`);
      if (res.ok) break;
    } catch {
      // not up yet
    }
    if (Date.now() > deadline) throw new Error('the server did not start for the browser tests');
    await new Promise((r) => setTimeout(r, 200));
  }
}

export async function teardown() {
  if (!server) return;
  server.kill('SIGTERM');
  await new Promise((r) => server!.once('exit', r));
}
