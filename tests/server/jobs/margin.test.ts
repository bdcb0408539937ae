import { beforeAll, describe, expect, it } from 'vitest';

import { checkMargin, warningKey } from '@/server/jobs/margin';
import { withTestApp } from '../fixtures';
import { signIn, verifiedUser } from '../helpers';
import { emailLog, mailsTo, marginRig, waitFor } from './helpers';

let owner: { id: string; email: string };
let member: { id: string; email: string };
let agent: Awaited<ReturnType<typeof signIn>>;
let rigId: string;
let setStay: Awaited<ReturnType<typeof marginRig>>['setStay'];
const warnings = async (email: string) => (await mailsTo(email)).filter((m) => /: margin (Tight|Short)/.test(m.subject));

const ctx = withTestApp({ workers: true });
beforeAll(async () => {
  owner = await verifiedUser(ctx, 'margin-owner');
  member = await verifiedUser(ctx, 'margin-member');
  agent = await signIn(ctx.app, owner.email);
  ({ rigId, setStay } = await marginRig(agent, 'Margin van'));
  const householdId = (await agent.get(`/api/rigs/${rigId}`)).body.householdId;
  await ctx.auth.api.addMember({ body: { userId: member.id, role: 'member', organizationId: householdId } });
  // The member hears only of Short.
  const memberAgent = await signIn(ctx.app, member.email);
  await memberAgent.put('/api/me/email-prefs').send({ reportsOn: false, reportWeekday: 6, reportHour: 18, timeZone: 'UTC', warningsOn: true, warnAt: 'short', noteEmailsOn: false }).expect(200);
});

describe('low-margin warnings', () => {
  it('warns once per fall, says who changed what, and again only after a recovery', async () => {
    const start = await setStay(1);
    expect(start.margin.state).toBe('comfortable');
    await checkMargin(ctx, rigId);
    const days = start.routine.daysToCutoff as number;
    expect(days).toBeGreaterThan(3);

    // Comfortable → Tight: one warning to the owner (the member waits for Short).
    const tight = await setStay(Math.floor(days * 10) / 10 - 0.3);
    expect(tight.margin.state).toBe('tight');
    const first = await waitFor(async () => (await warnings(owner.email))[0], 15_000, 'the first warning');
    expect(first.subject).toBe(`Margin van: margin Tight, ${start.parked.daysToCutoff.toFixed(1)} days parked`);
    expect(first.text).toMatch(/margin-owner changed planned stay 1 → [\d.]+ days: days parked [\d.]+ days → [\d.]+ days\./);
    expect(first.text).toContain('THE TOP FIX');

    // Still Tight after another change: nothing more.
    await setStay(Math.floor(days * 10) / 10 - 0.2);
    await checkMargin(ctx, rigId);
    await new Promise((r) => setTimeout(r, 1500));
    expect(await warnings(owner.email)).toHaveLength(1);
    expect(await warnings(member.email)).toHaveLength(0);

    // Recovery, then a fall to Short: a second warning to the owner, the first to the member.
    expect((await setStay(1)).margin.state).toBe('comfortable');
    await checkMargin(ctx, rigId);
    expect((await setStay(Math.ceil(days) + 2)).margin.state).toBe('short');
    await checkMargin(ctx, rigId);
    await waitFor(async () => (await warnings(owner.email)).length === 2 && (await warnings(member.email)).length === 1, 15_000, 'the second fall’s warnings');
    expect((await emailLog(ctx, warningKey(owner.id, rigId, 2)))?.status).toBe('sent');
    await new Promise((r) => setTimeout(r, 1000));
    expect(await warnings(owner.email)).toHaveLength(2);
  });

  it('sends nothing to someone who turned warnings off', async () => {
    await ctx.db.updateTable('email_prefs').set({ warnings_on: false }).where('user_id', '=', member.id).execute();
    await setStay(1);
    await checkMargin(ctx, rigId);
    await setStay(60);
    const result = await checkMargin(ctx, rigId);
    expect(result.state).toBe('short');
    await waitFor(async () => (await warnings(owner.email)).length === 3, 15_000, 'the owner’s third warning');
    expect(await warnings(member.email)).toHaveLength(1);
  });
});
