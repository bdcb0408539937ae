import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { figuresOfRigs } from '@/server/jobs/figures';
import { checkMargin } from '@/server/jobs/margin';
import { sendReport } from '@/server/jobs/reports';
import { signIn, verifiedUser } from '../helpers';
import { makeTestApp, TEST_ORIGIN } from '../test-app';
import { mailsTo, waitFor } from './helpers';

// Energy = charge × voltage (common practice): on this 24 V rig 1 Ah is 24 Wh. The fridge's 45 W at a
// 35 % duty over 24 h is 378 Wh a day, 15.75 Ah at 24 V, with whichever unit a person reads it in.
const V = 24;
const POWER = {
  systemVoltage: V,
  battery: { chemistry: 'lifepo4', capacityAh: 200 },
  inverter: null,
  charging: { alternatorA: 20, drivingMinutesPerDay: [0, 0, 0, 0, 0, 0, 0] },
  plannedStayDays: 1,
};

let ctx: Awaited<ReturnType<typeof makeTestApp>>;
let wh: { id: string; email: string };
let ah: { id: string; email: string };
let owner: Awaited<ReturnType<typeof signIn>>;
let rigId: string;

const figures = async () => {
  const rig = await ctx.db.selectFrom('rigs').select(['id', 'name', 'version', 'power']).where('id', '=', rigId).executeTakeFirstOrThrow();
  return (await figuresOfRigs(ctx.db, [rig])).get(rigId)!;
};

beforeAll(async () => {
  // No workers: the test runs each margin check itself, so no second check races it to the warning.
  ctx = await makeTestApp();
  wh = await verifiedUser(ctx, 'units-wh');
  ah = await verifiedUser(ctx, 'units-ah');
  owner = await signIn(ctx.app, wh.email);
  const member = await signIn(ctx.app, ah.email);
  const created = await owner
    .post('/api/rigs')
    .set('Origin', TEST_ORIGIN)
    .send({ name: 'Volt van', vehicle: 'test', power: POWER, loads: [{ name: 'Fridge', supply: 'dc', watts: 45, dutyPercent: 35, hoursPerDay: 24 }] })
    .expect(201);
  rigId = created.body.id;
  await ctx.auth.api.addMember({ body: { userId: ah.id, role: 'member', organizationId: (await owner.get(`/api/rigs/${rigId}`)).body.householdId } });
  await owner.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Wh' }).expect(200);
  await member.put('/api/me/units').set('Origin', TEST_ORIGIN).send({ energy: 'Ah' }).expect(200);
});
afterAll(async () => {
  await ctx.jobs.stop();
  await ctx.db.destroy();
});

const figuresIn = (line: string, unit: 'Ah' | 'Wh') => [...line.matchAll(new RegExp(`([\\d,]+(?:\\.\\d+)?) ${unit}\\b`, 'g'))].map((m) => Number(m[1].replaceAll(',', '')));

describe('e-mails in the reader’s energy unit', () => {
  it('states the low-margin warning’s changes and top Fix in each reader’s unit', async () => {
    expect((await checkMargin(ctx, rigId)).state).toBe('comfortable');
    // Half the battery and a ten-day stay: Short.
    const rig = (await owner.get(`/api/rigs/${rigId}`).expect(200)).body;
    await owner
      .patch(`/api/rigs/${rigId}`)
      .set('Origin', TEST_ORIGIN)
      .send({ version: rig.version, power: { ...rig.power, battery: { ...rig.power.battery, capacityAh: 100 }, plannedStayDays: 10 } })
      .expect(200);
    expect((await checkMargin(ctx, rigId)).sent).toBe(2);
    const warning = (email: string) => waitFor(async () => (await mailsTo(email)).find((m) => /Volt van: margin Short/.test(m.subject)), 15_000, `the warning to ${email}`);
    const inWh = await warning(wh.email);
    const inAh = await warning(ah.email);

    // The history entry: 200 Ah → 100 Ah, which is 4,800 Wh → 2,400 Wh at 24 V.
    expect(inAh.text).toContain('changed battery (200 Ah → 100 Ah)');
    expect(inWh.text).toContain('changed battery (4,800 Wh → 2,400 Wh)');
    // The top Fix reads the same but for its energy figures, each 24 times as many Wh as the other's Ah.
    const top = (text: string) => text.split('THE TOP FIX\n')[1].split('\n')[0];
    expect(figuresIn(top(inWh.text), 'Wh')).toEqual(figuresIn(top(inAh.text), 'Ah').map((n) => Math.round(n * V)));
    expect(top(inWh.text).replace(/[\d,]+ Wh\b/g, 'E')).toBe(top(inAh.text).replace(/[\d,]+(?:\.\d+)? Ah\b/g, 'E'));
    expect(inWh.text).not.toMatch(/\d\s?Ah\b/);
  });

  it('states the weekly report’s drains and Fixes in Wh at the rig’s 24 V for one reader, in Ah for the other', async () => {
    const f = await figures();
    expect(f.systemVoltage).toBe(24);
    const fridge = f.drains.find((d) => d.name === 'Fridge')!;
    expect(fridge.ahPerDay).toBeCloseTo(15.75, 2); // 45 W × 0.35 × 24 h / 24 V
    for (const who of [wh, ah]) await sendReport(ctx, { userId: who.id, rigId, weekKey: 'units-week', scheduledFor: '2026-12-06T18:00:00Z', figures: f });
    const report = (email: string) => waitFor(async () => (await mailsTo(email)).find((m) => m.text.includes('week of units-week')), 15_000, `the report to ${email}`);
    const inWh = await report(wh.email);
    const inAh = await report(ah.email);

    expect(inAh.text).toContain(`  Fridge: 15.8 Ah a day, ${fridge.sharePercent} %`);
    expect(inWh.text).toContain(`  Fridge: 378 Wh a day, ${fridge.sharePercent} %`);
    expect(inWh.html).toContain('378 Wh a day');
    // Every drain: the Ah reader gets the model's amp-hours, the Wh reader those times 24 V.
    for (const d of f.drains) {
      expect(inAh.text).toContain(`${d.ahPerDay.toFixed(1)} Ah a day`);
      expect(inWh.text).toContain(`${(d.ahPerDay * V).toFixed(0)} Wh a day`);
    }
    // The Fixes: the bigger battery bank names amp-hours; the Wh reader gets 24 times as many watt-hours.
    const fixes = (text: string) => text.split('TOP FIXES\n')[1].split('\n').slice(0, f.fixes.length);
    const bank = fixes(inAh.text).findIndex((l) => /battery (bank|of about)/.test(l));
    expect(bank).toBeGreaterThanOrEqual(0);
    expect(figuresIn(fixes(inAh.text)[bank], 'Ah').length).toBeGreaterThan(0);
    fixes(inAh.text).forEach((line, i) => expect(figuresIn(fixes(inWh.text)[i], 'Wh')).toEqual(figuresIn(line, 'Ah').map((n) => Math.round(n * V))));
    expect(inWh.text).not.toMatch(/\d\s?Ah\b/);
    expect(inWh.subject).toBe(inAh.subject);
  });

  it('previews the next report in the caller’s unit', async () => {
    const f = await figures();
    const fridge = f.drains.find((d) => d.name === 'Fridge')!;
    const preview = (await owner.get(`/api/rigs/${rigId}/report-preview`).expect(200)).text;
    expect(preview).toContain(`${(fridge.ahPerDay * V).toFixed(0)} Wh a day`);
    expect(preview).not.toMatch(/\d\s?Ah\b/);
    const member = await signIn(ctx.app, ah.email);
    expect((await member.get(`/api/rigs/${rigId}/report-preview`).expect(200)).text).toContain(`${fridge.ahPerDay.toFixed(1)} Ah a day`);
  });
});
