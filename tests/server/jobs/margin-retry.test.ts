import { beforeAll, describe, expect, it } from 'vitest';

import { checkMargin, warningKey } from '@/server/jobs/margin';
import { withTestApp } from '../fixtures';
import { signIn, verifiedUser, WREN_POWER } from '../helpers';
import { emailLog, mailsTo } from './helpers';

// The same rig set-up as margin.test.ts (a 400 Ah AGM bank and a fridge; the planned stay alone moves the
// margin), on an app whose workers do not run: the test calls each check itself.
const POWER = { ...WREN_POWER, battery: { chemistry: 'agm', capacityAh: 400 }, inverter: null };

const ctx = withTestApp();
let owner: { id: string; email: string };
let agent: Awaited<ReturnType<typeof signIn>>;
let rigId: string;

async function setStay(days: number) {
  const rig = (await agent.get(`/api/rigs/${rigId}`).expect(200)).body;
  await agent.patch(`/api/rigs/${rigId}`).send({ version: rig.version, power: { ...rig.power, plannedStayDays: days } }).expect(200);
  return (await agent.get(`/api/rigs/${rigId}/outlook`).expect(200)).body;
}

beforeAll(async () => {
  owner = await verifiedUser(ctx, 'margin-retry');
  agent = await signIn(ctx.app, owner.email);
  const created = await agent
    .post('/api/rigs')
    .send({ name: 'Retry van', vehicle: 'test', power: { ...POWER, plannedStayDays: 1 }, loads: [{ name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 }] })
    .expect(201);
  rigId = created.body.id;
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
