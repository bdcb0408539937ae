import { beforeAll, describe, expect, it } from 'vitest';

import { checkMargin, warningKey } from '@/server/jobs/margin';
import { withTestApp } from '../fixtures';
import { signIn, verifiedUser } from '../helpers';
import { emailLog, mailsTo, marginRig } from './helpers';

// The same rig as margin.test.ts (marginRig: the planned stay alone moves the margin), on an app whose
// workers do not run: the test calls each check itself.
const ctx = withTestApp();
let owner: { id: string; email: string };
let rigId: string;
let setStay: Awaited<ReturnType<typeof marginRig>>['setStay'];

beforeAll(async () => {
  owner = await verifiedUser(ctx, 'margin-retry');
  ({ rigId, setStay } = await marginRig(await signIn(ctx.app, owner.email), 'Retry van'));
});

describe('a low-margin warning written by a later check of the same fall', () => {
  it('still says who changed what since the rig was last Comfortable', async () => {
    const start = await setStay(1);
    expect((await checkMargin(ctx, rigId)).state).toBe('comfortable');
    const days = start.routine.daysToCutoff as number;
    expect((await setStay(Math.floor(days * 10) / 10 - 0.3)).margin.state).toBe('tight');

    // The check that saw the fall cannot send (the mail server refuses): the row says so and the job would retry.
    const down = { ...ctx, mailer: { send: () => Promise.reject(new Error('mail server down')) } };
    await expect(checkMargin(down, rigId)).rejects.toThrow('mail server down');
    expect((await emailLog(ctx, warningKey(owner.id, rigId, 1)))?.status).toBe('failed');

    // The retry (or a second check that ran beside it) runs after the first saved Tight: same fall, same story.
    expect(await checkMargin(ctx, rigId)).toEqual({ state: 'tight', sent: 1 });
    const [mail] = (await mailsTo(owner.email)).filter((m) => m.subject.startsWith('Retry van: margin Tight'));
    expect(mail.text).toMatch(/margin-retry changed planned stay 1 → [\d.]+ days: days parked/);
    expect(mail.text).not.toContain('No one changed the rig');
  });
});
