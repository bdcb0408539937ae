import request from 'supertest';
import { describe, expect, it } from 'vitest';

import { STOAT, WREN } from '@/shared/demo/scenario';
import { withTestApp } from './fixtures';
import { makeTestApp } from './test-app';

const ctx = withTestApp();

const post = (body: unknown, path = '/api/projections') => request(ctx.app).post(path).send(body as object);
const fieldPaths = (res: request.Response) => (res.body.fields as { path: string }[]).map((f) => f.path);

describe('POST /api/projections', () => {
  it('projects the demo rig Wren with its headline figures, series and Fixes', async () => {
    const res = await post(WREN).expect(200);
    expect(res.body.parked.daysToCutoff).toBeGreaterThan(0);
    expect(res.body.series).toHaveLength(14 * 24);
    // The margin is the days to cut-off on the routine minus the planned stay (PRODUCT.md): Wren's stay is
    // 5 days and its routine reaches the cut-off well before, so the margin is below zero: Short.
    expect(res.body.margin.plannedStayDays).toBe(5);
    expect(res.body.margin.days).toBeCloseTo(res.body.routine.daysToCutoff - 5, 2);
    expect(res.body.margin.days).toBeLessThan(0);
    expect(res.body.margin.state).toBe('short');
    expect(res.body.fixes.map((f: { kind: string }) => f.kind)).toContain('cutoff-switch');
    expect(res.body.standby.inverterIdleAh).toBeGreaterThan(0);
  });

  it('fills the documented defaults for a minimal rig', async () => {
    const res = await post({ battery: { chemistry: 'lifepo4', capacityAh: 100 } }).expect(200);
    expect(res.body.cutoffSocPercent).toBe(20);
    expect(res.body.horizonDays).toBe(14);
    expect(res.body.parked.daysToCutoff).toBeNull();
  });

  it('refuses a body without a battery, naming the field', async () => {
    const res = await post({ systemVoltage: 12, loads: [] }).expect(400);
    expect(res.body.code).toBe('validation_failed');
    expect(fieldPaths(res)).toContain('battery');
  });

  it('names every wrong field: non-numbers, negatives and out-of-range values', async () => {
    const res = await post({
      systemVoltage: 'twelve',
      battery: { chemistry: 'unobtainium', capacityAh: -100, startSocPercent: 140 },
      loads: [{ name: 'Fridge', supply: 'dc', watts: -5, hoursPerDay: 30 }],
      charging: { drivingMinutesPerDay: [0, 0, 0] },
    }).expect(400);
    expect(fieldPaths(res)).toEqual(
      expect.arrayContaining([
        'systemVoltage',
        'battery.chemistry',
        'battery.capacityAh',
        'battery.startSocPercent',
        'loads.0.watts',
        'loads.0.hoursPerDay',
        'charging.drivingMinutesPerDay',
      ]),
    );
  });

  it('refuses NaN and Infinity however they are sent', async () => {
    const asText = await request(ctx.app).post('/api/projections').set('Content-Type', 'application/json').send('{"battery":{"chemistry":"agm","capacityAh":NaN}}');
    expect(asText.status).toBe(400);
    const asString = await post({ battery: { chemistry: 'agm', capacityAh: 'NaN' } }).expect(400);
    expect(fieldPaths(asString)).toContain('battery.capacityAh');
    const huge = await post({ battery: { chemistry: 'agm', capacityAh: 1e308 * 10 } }).expect(400);
    expect(fieldPaths(huge)).toContain('battery.capacityAh');
  });

  it('refuses a load that gives both watts and amps, or neither', async () => {
    const res = await post({
      battery: { chemistry: 'agm', capacityAh: 100 },
      loads: [
        { name: 'A', supply: 'dc', watts: 5, amps: 1, hoursPerDay: 1 },
        { name: 'B', supply: 'dc', hoursPerDay: 1 },
      ],
    }).expect(400);
    expect(fieldPaths(res)).toEqual(expect.arrayContaining(['loads.0.watts', 'loads.1.watts']));
  });

  it('refuses an AC load on a rig without an inverter', async () => {
    const res = await post({ battery: { chemistry: 'agm', capacityAh: 100 }, loads: [{ name: 'Laptop', supply: 'ac', watts: 60, hoursPerDay: 2 }] }).expect(400);
    expect(fieldPaths(res)).toContain('loads.0.supply');
  });

  it('refuses a huge array of loads with 400 and a body over the size limit with 413', async () => {
    const many = Array.from({ length: 201 }, (_, i) => ({ name: `Load ${i}`, supply: 'dc', watts: 1, hoursPerDay: 1 }));
    const res = await post({ battery: { chemistry: 'agm', capacityAh: 100 }, loads: many }).expect(400);
    expect(fieldPaths(res)).toContain('loads');
    const giant = Array.from({ length: 20_000 }, (_, i) => ({ name: `Load number ${i} with a long name`, supply: 'dc', watts: 1, hoursPerDay: 1 }));
    const big = await post({ battery: { chemistry: 'agm', capacityAh: 100 }, loads: giant });
    expect(big.status).toBe(413);
    expect(big.body.code).toBe('payload_too_large');
  });

  it('answers a body that is an array or a string with 400', async () => {
    expect((await post([1, 2, 3])).status).toBe(400);
    expect((await request(ctx.app).post('/api/projections').set('Content-Type', 'application/json').send('"rig"')).status).toBe(400);
  });
});

describe('POST /api/projections: figures a traveller can trust', () => {
  it('blocks charging a frozen LiFePO4 bank, and a self-heating one charges after warming', async () => {
    // 100 Ah LiFePO4 at -5 °C (85 Ah usable, from memory), a 1 A load, a 20 A DC-DC charger on a daily
    // 2-hour drive at 10:00. Frozen, the day ends at 42.5 − 22 = 20.5 Ah; self-heating (50 W for an hour,
    // from memory), the second hour stores (20 − 1) × 0.97 = 18.43 Ah (LiFePO4 charge efficiency, common practice).
    const rig = (selfHeating: boolean) => ({
      battery: { chemistry: 'lifepo4', capacityAh: 100, temperatureC: -5, startSocPercent: 50, cutoffSocPercent: 20, selfDischargePercentPerMonth: 0, selfHeating },
      loads: [{ name: 'Lamp', supply: 'dc', amps: 1, hoursPerDay: 24 }],
      charging: { alternatorA: 20, charger: 'dc-dc', drivingMinutesPerDay: [120, 120, 120, 120, 120, 120, 120], drivingStartHour: 10 },
      start: { weekday: 0, hour: 0 },
    });
    const frozen = await post(rig(false)).expect(200);
    expect(frozen.body.series[23].ah).toBeCloseTo(20.5, 2);
    expect(frozen.body.routine.holds).toBe(false);
    expect(frozen.body.warnings.map((w: { code: string }) => w.code)).toContain('lifepo4-cold-charge');
    const heated = await post(rig(true)).expect(200);
    expect(heated.body.series[23].ah).toBeCloseTo(38.93, 2);
    expect(heated.body.balance.heatingAh).toBeCloseTo((7 * 50) / 12, 2);
  });

  it('works the margin over the whole planned stay and starts the chart at the starting charge', async () => {
    // 2.5 Ah a day to the 50 % cut-off of 100 Ah AGM: day 20; a 25-day stay is Short by 5 days.
    const res = await post({
      battery: { chemistry: 'agm', capacityAh: 100, cutoffSocPercent: 50, selfDischargePercentPerMonth: 0, startSocPercent: 100 },
      loads: [{ name: 'Router', supply: 'dc', amps: 2.5 / 24, hoursPerDay: 24 }],
      plannedStayDays: 25,
    }).expect(200);
    expect(res.body.margin).toMatchObject({ state: 'short', coveredDays: 33 });
    expect(res.body.margin.days).toBeCloseTo(-5, 1);
    expect(res.body.start.socPercent).toBe(100);
  });

  it('says which essential load an ignition relay would stop, and how much a day', async () => {
    // A 30 W CPAP on the inverter for 8 h: 30 / (12 × 0.9) × 8 = 22.22 Ah a night not served while parked.
    const res = await post({
      battery: { chemistry: 'agm', capacityAh: 100 },
      inverter: { ratedW: 300, idleA: 0.5, control: 'always-on' },
      loads: [{ name: 'CPAP', supply: 'ac', watts: 30, hoursPerDay: 8, startHour: 23, when: 'parked', essential: true }],
    }).expect(200);
    const relay = res.body.fixes.find((f: { kind: string }) => f.kind === 'ignition-relay');
    expect(relay).toMatchObject({ cutsEssential: true, stops: { loads: ['CPAP'], essentialLoads: ['CPAP'], when: 'parked' } });
    expect(relay.stops.ahPerDayNotServed).toBeCloseTo(22.22, 2);
  });

  it('refuses a self-heating flag that is not a boolean, naming the field', async () => {
    const res = await post({ battery: { chemistry: 'lifepo4', capacityAh: 100, selfHeating: 'yes' } }).expect(400);
    expect(fieldPaths(res)).toContain('battery.selfHeating');
  });
});

describe('POST /api/projections/compare (Try a load)', () => {
  it('answers both sides and the deltas for a candidate load', async () => {
    const res = await post(
      { rig: STOAT, candidates: [{ name: 'Cool box', supply: 'dc', watts: 40, dutyPercent: 50, hoursPerDay: 24, status: 'candidate' }] },
      '/api/projections/compare',
    ).expect(200);
    expect(res.body.with.dailyAh).toBeGreaterThan(res.body.without.dailyAh);
    // 40 W × 50 % × 24 h / 12 V = 40 Ah a day; its 3.33 A running current is above Stoat's 45 Ah / 20 h
    // = 2.25 A, so Peukert (flooded k = 1.25, from memory) costs (3.33 / 2.25)^0.25 = 1.103 times that:
    // 44.13 Ah, less about 0.05 Ah a day in the drives, when the alternator carries it.
    expect(res.body.candidates[0].ahPerDay).toBeCloseTo(44.1, 1);
    expect(res.body.delta.dailyAh).toBeCloseTo(44, 0);
  });

  it('asks for at least one candidate', async () => {
    const res = await post({ rig: WREN, candidates: [] }, '/api/projections/compare').expect(400);
    expect(fieldPaths(res)).toContain('candidates');
  });

  it('names wrong fields inside the rig', async () => {
    const res = await post({ rig: { battery: { chemistry: 'agm' } }, candidates: [] }, '/api/projections/compare').expect(400);
    expect(fieldPaths(res)).toContain('rig.battery.capacityAh');
  });
});

describe('rate limit', () => {
  it('answers 429 once an address has used its projections for the minute', async () => {
    const limited = await makeTestApp({ RATE_LIMIT_PER_MINUTE: '3' });
    for (let i = 0; i < 3; i++) await request(limited.app).post('/api/projections').send({ battery: { chemistry: 'agm', capacityAh: 50 } }).expect(200);
    const res = await request(limited.app).post('/api/projections').send({ battery: { chemistry: 'agm', capacityAh: 50 } });
    expect(res.status).toBe(429);
    expect(res.body.code).toBe('rate_limited');
    await limited.db.destroy();
  });
});

describe('POST /api/projections on the calendar', () => {
  const rig = { battery: { chemistry: 'agm', capacityAh: 100 }, charging: { solarW: 200 }, start: { hour: 0, date: '2026-06-21' }, location: { latitudeDeg: 50 } };

  it('takes the sun of the place and date and reports the amp-hours a day it used', async () => {
    const res = await post(rig).expect(200);
    expect(res.body.solar.source).toBe('place-and-date');
    // FAO-56 eqs. 21 and 37 by hand: 8.71 peak sun hours at 50° N on 21 June; 200 W × 8.71 × 0.75 / 12 V = 109 Ah.
    expect(res.body.solar.dailyAh[0]).toBeCloseTo(109, -1);
  });

  it('answers as before without a date', async () => {
    const res = await post({ ...rig, start: { hour: 0 } }).expect(200);
    expect(res.body.solar.source).toBe('peak-sun-hours');
  });

  it('names a date that does not exist and a latitude beyond the pole', async () => {
    const res = await post({ ...rig, start: { hour: 0, date: '2026-13-01' }, location: { latitudeDeg: -91 } }).expect(400);
    expect(fieldPaths(res)).toEqual(expect.arrayContaining(['start.date', 'location.latitudeDeg']));
  });
});
