import { beforeAll, describe, expect, it } from 'vitest';

import { figuresOfRigs } from '@/server/jobs/figures';
import { checkMargin } from '@/server/jobs/margin';
import { sendReport } from '@/server/jobs/reports';
import { withTestApp } from '../fixtures';
import { signIn, verifiedUser, WREN_POWER } from '../helpers';
import { mailsTo, waitFor } from './helpers';

let owner: { id: string; email: string };
let agent: Awaited<ReturnType<typeof signIn>>;
let rigId: string;

// 100 Ah of AGM and a 45 W fridge at 35 %: 31.5 Ah a day, so the 50 Ah above the cut-off last about 1.6 days:
// Comfortable with no planned stay, Short for five nights at a lake.
const POWER = { ...WREN_POWER, battery: { chemistry: 'agm', capacityAh: 100 }, inverter: null, plannedStayDays: 0 };
const TRIP = {
  name: 'Lake week',
  startDate: '2026-06-05',
  active: true,
  legs: [
    { kind: 'stay', name: 'the lake', latitudeDeg: 47.5, nights: 5, lowC: 12, highC: 24 },
    { kind: 'stay', name: 'the farm', latitudeDeg: 47.1, nights: 2, lowC: 10, highC: 22, shore: true },
  ],
};

const ctx = withTestApp({ workers: true });
beforeAll(async () => {
  owner = await verifiedUser(ctx, 'trip-owner');
  agent = await signIn(ctx.app, owner.email);
  const created = await agent
    .post('/api/rigs')
    .send({ name: 'Trip van', vehicle: 'test', power: POWER, loads: [{ name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 }] })
    .expect(201);
  rigId = created.body.id;
});

describe('e-mails that follow the active trip', () => {
  it('warns that the stay at the lake ends Short, naming the trip and each stay', async () => {
    expect((await checkMargin(ctx, rigId)).state).toBe('comfortable');
    await agent.post(`/api/rigs/${rigId}/trips`).send(TRIP).expect(201);
    await checkMargin(ctx, rigId);
    const mail = await waitFor(async () => (await mailsTo(owner.email)).find((m) => /: margin Short/.test(m.subject)), 15_000, 'the trip warning');
    expect(mail.text).toContain('on the trip “Lake week”');
    expect(mail.text).toMatch(/The stay at the lake \(5 June to 10 June\) ends Short: \d+ % on leaving, the cut-off comes [\d.]+ days before leaving\./);
    // The lake runs the battery down; the farm's shore power lifts it back: Tight, not Short.
    expect(mail.text).toContain('The stay at the farm (10 June to 12 June) ends Tight: 100 % on leaving, arriving below the cut-off.');
  });

  it('puts the trip\'s stays in the weekly report', async () => {
    const rig = await ctx.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', rigId).executeTakeFirstOrThrow();
    const figures = (await figuresOfRigs(ctx.db, [rig])).get(rigId)!;
    expect(figures.trip?.stays.map((s) => s.marginState)).toEqual(['short', 'tight']);
    await sendReport(ctx, { userId: owner.id, rigId, weekKey: '2026-W23', scheduledFor: '2026-06-01T18:00:00Z', figures });
    const report = await waitFor(async () => (await mailsTo(owner.email)).find((m) => /your week ahead|parked, margin/.test(m.subject) && !/: margin Short/.test(m.subject)), 15_000, 'the report');
    expect(report.text).toMatch(/YOUR TRIP: LAKE WEEK/i);
    expect(report.text).toContain('The stay at the lake (5 June to 10 June) ends Short');
  });
});
