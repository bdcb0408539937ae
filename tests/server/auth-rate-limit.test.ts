import { describe, expect, it } from 'vitest';

import { agentFor } from './helpers';
import { makeTestApp } from './test-app';

// Its own file: better-auth's in-memory rate-limit counters are shared by every instance in a process,
// so this runs before anything else signs in from 127.0.0.1.
describe('sign-in rate limit', () => {
  it('answers 429 after too many attempts from one address in a minute', async () => {
    const limited = await makeTestApp({ SIGN_IN_LIMIT_PER_MINUTE: '3' });
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await agentFor(limited.app).post('/api/auth/sign-in/email').send({ email: 'ines@example.org', password: 'wrong-password' });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 3)).toEqual([401, 401, 401]);
    expect(statuses.at(-1)).toBe(429);
    await limited.db.destroy();
  });
});

