import * as fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { type LoadInput, type ProjectionInputRaw, projectionInputSchema } from '@/shared/schemas/projection';

// Properties over random valid rigs. Each run is a full projection with Fixes, so the run counts are modest.
const RUNS = Number(process.env.FC_RUNS ?? 60);

type Options = { controls?: readonly ('always-on' | 'manual-switch' | 'ignition-relay' | 'low-voltage-disconnect')[]; whens?: readonly ('always' | 'parked' | 'driving')[] };

const loadArb = (whens: Options['whens'] = ['always', 'parked', 'driving']) =>
  fc.record({
    name: fc.constantFrom('Fridge', 'Lights', 'Fan', 'Laptop', 'Phone', 'Pump'),
    supply: fc.constantFrom('dc', 'ac'),
    watts: fc.double({ min: 1, max: 150, noNaN: true }),
    dutyPercent: fc.integer({ min: 10, max: 100 }),
    hoursPerDay: fc.double({ min: 0, max: 24, noNaN: true }),
    startHour: fc.option(fc.integer({ min: 0, max: 23 }), { nil: undefined }),
    when: fc.constantFrom(...whens),
  }) as fc.Arbitrary<LoadInput>;

const rigArb = (opts: Options = {}) =>
  fc.record({
    systemVoltage: fc.constantFrom(12, 24),
    battery: fc.record({
      chemistry: fc.constantFrom('flooded', 'agm', 'gel', 'lifepo4'),
      capacityAh: fc.integer({ min: 20, max: 400 }),
      healthPercent: fc.integer({ min: 50, max: 100 }),
      temperatureC: fc.integer({ min: -20, max: 40 }),
      startSocPercent: fc.integer({ min: 30, max: 100 }),
      role: fc.constantFrom('house', 'starter'),
    }),
    inverter: fc.record({
      ratedW: fc.integer({ min: 150, max: 2000 }),
      efficiencyPercent: fc.integer({ min: 80, max: 95 }),
      idleA: fc.double({ min: 0, max: 1.5, noNaN: true }),
      control: fc.constantFrom(...(opts.controls ?? (['always-on', 'manual-switch', 'ignition-relay', 'low-voltage-disconnect'] as const))),
    }),
    keyOffDrawA: fc.double({ min: 0, max: 0.1, noNaN: true }),
    loads: fc.array(loadArb(opts.whens), { maxLength: 6 }),
    charging: fc.record({
      alternatorA: fc.integer({ min: 0, max: 60 }),
      drivingMinutesPerDay: fc.array(fc.integer({ min: 0, max: 120 }), { minLength: 7, maxLength: 7 }),
      solarW: fc.constantFrom(0, 0, 100, 200),
      peakSunHours: fc.constantFrom(0, 3, 5),
    }),
    plannedStayDays: fc.integer({ min: 0, max: 10 }),
    horizonDays: fc.integer({ min: 3, max: 21 }),
    start: fc.record({ weekday: fc.integer({ min: 0, max: 6 }), hour: fc.integer({ min: 0, max: 23 }) }),
  }) as fc.Arbitrary<ProjectionInputRaw>;

const days = (d: number | null, horizon: number) => d ?? horizon + 1;
const EPS = 0.011; // days are rounded to 0.01

describe('energy model properties', () => {
  it('keeps the state of charge within 0..100 %', () => {
    fc.assert(
      fc.property(rigArb(), (raw) => {
        const p = project(projectionInputSchema.parse(raw), { fixes: false });
        for (const s of p.series) {
          expect(s.socPercent).toBeGreaterThanOrEqual(0);
          expect(s.socPercent).toBeLessThanOrEqual(100);
          expect(s.parkedSocPercent).toBeGreaterThanOrEqual(0);
          expect(s.parkedSocPercent).toBeLessThanOrEqual(100);
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('never lengthens days to cut-off when a load is added', () => {
    // A low-voltage disconnect is left out: its reconnect hysteresis lets a lower battery run its
    // inverter less, so the ordering of two runs is not guaranteed there.
    fc.assert(
      fc.property(rigArb({ controls: ['always-on', 'manual-switch', 'ignition-relay'] }), loadArb(), (raw, extra) => {
        const a = project(projectionInputSchema.parse(raw), { fixes: false });
        const b = project(projectionInputSchema.parse({ ...raw, loads: [...(raw.loads ?? []), extra] }), { fixes: false });
        const h = a.margin.coveredDays; // days are counted over the run that covers the stay
        expect(days(b.parked.daysToCutoff, h)).toBeLessThanOrEqual(days(a.parked.daysToCutoff, h) + EPS);
        expect(days(b.routine.daysToCutoff, h)).toBeLessThanOrEqual(days(a.routine.daysToCutoff, h) + EPS);
      }),
      { numRuns: RUNS },
    );
  });

  it('never shortens days to cut-off with a bigger battery', () => {
    fc.assert(
      fc.property(rigArb(), fc.integer({ min: 10, max: 400 }), (raw, more) => {
        const a = project(projectionInputSchema.parse(raw), { fixes: false });
        const bigger = { ...raw, battery: { ...raw.battery, capacityAh: raw.battery.capacityAh + more } };
        const b = project(projectionInputSchema.parse(bigger), { fixes: false });
        const h = a.margin.coveredDays; // days are counted over the run that covers the stay
        expect(days(b.parked.daysToCutoff, h)).toBeGreaterThanOrEqual(days(a.parked.daysToCutoff, h) - EPS);
        expect(days(b.routine.daysToCutoff, h)).toBeGreaterThanOrEqual(days(a.routine.daysToCutoff, h) - EPS);
      }),
      { numRuns: RUNS },
    );
  });

  it('never shortens the routine figure with more driving', () => {
    // Loads that run only while driving, and an ignition relay (which powers the inverter while
    // driving), add demand with every minute driven; with those left out driving only adds charge.
    fc.assert(
      fc.property(
        rigArb({ controls: ['always-on', 'manual-switch', 'low-voltage-disconnect'], whens: ['always', 'parked'] }),
        fc.integer({ min: 0, max: 6 }),
        fc.integer({ min: 5, max: 120 }),
        (raw, day, extra) => {
          const a = project(projectionInputSchema.parse(raw), { fixes: false });
          const minutes = [...raw.charging!.drivingMinutesPerDay!];
          minutes[day] += extra;
          const b = project(projectionInputSchema.parse({ ...raw, charging: { ...raw.charging, drivingMinutesPerDay: minutes } }), { fixes: false });
          const h = a.margin.coveredDays; // days are counted over the run that covers the stay
          expect(days(b.routine.daysToCutoff, h)).toBeGreaterThanOrEqual(days(a.routine.daysToCutoff, h) - EPS);
        },
      ),
      { numRuns: RUNS },
    );
  });

  it('lists only Fixes that gain days, and each gain is what the changed rig projects', () => {
    fc.assert(
      fc.property(rigArb(), (raw) => {
        const input = projectionInputSchema.parse(raw);
        const p = project(input);
        const h = p.margin.coveredDays;
        for (const fix of p.fixes) {
          expect(fix.daysGainedParked > 0 || fix.daysGainedRoutine > 0).toBe(true);
          const c = fix.change as { inverter?: object; battery?: object; charging?: object };
          const changed = projectionInputSchema.parse({
            ...raw,
            inverter: c.inverter ? { ...raw.inverter, ...c.inverter } : raw.inverter,
            battery: c.battery ? { ...raw.battery, ...c.battery } : raw.battery,
            charging: c.charging ? { ...raw.charging, ...c.charging } : raw.charging,
          });
          const q = project(changed, { fixes: false });
          const gain = days(q.routine.daysToCutoff, h - 1) - days(p.routine.daysToCutoff, h - 1);
          expect(gain).toBeCloseTo(fix.daysGainedRoutine, 1);
        }
        const gains = p.fixes.map((f) => f.daysGainedRoutine);
        expect([...gains].sort((x, y) => y - x)).toEqual(gains);
      }),
      { numRuns: Math.ceil((RUNS * 2) / 3) },
    );
  });

  it('judges "holds" and every figure of the week the same for every start hour of the same week', () => {
    fc.assert(
      fc.property(rigArb(), fc.array(fc.integer({ min: 0, max: 167 }), { minLength: 3, maxLength: 3 }), (raw, hours) => {
        const at = (how: number) => project(projectionInputSchema.parse({ ...raw, start: { weekday: Math.floor(how / 24), hour: how % 24 } }), { fixes: false });
        const first = at(0);
        for (const how of hours) {
          const p = at(how);
          expect(p.routine.holds).toBe(first.routine.holds);
          expect(p.balance).toEqual(first.balance);
          expect(p.daily).toEqual(first.daily);
          expect(p.standby).toEqual(first.standby);
          expect(p.breakdown).toEqual(first.breakdown);
        }
      }),
      { numRuns: RUNS },
    );
  });

  it('moves no figure by more than 0.1 point when the step is halved', () => {
    fc.assert(
      fc.property(rigArb(), (raw) => {
        const input = projectionInputSchema.parse(raw);
        const a = project(input, { fixes: false });
        const b = project(input, { fixes: false, substeps: 2 });
        for (let i = 0; i < a.series.length; i++) {
          expect(Math.abs(a.series[i].socPercent - b.series[i].socPercent)).toBeLessThanOrEqual(0.1);
          expect(Math.abs(a.series[i].parkedSocPercent - b.series[i].parkedSocPercent)).toBeLessThanOrEqual(0.1);
        }
        expect(b.routine.holds).toBe(a.routine.holds);
        // Days, and the daily figures as points of the usable capacity (beside their rounding to 0.01 Ah).
        const usable = a.assumptions.usableAh as number;
        const close = (x: number, y: number) => expect(Math.abs(x - y)).toBeLessThanOrEqual(0.001 * usable + 0.0101);
        close(a.daily.consumptionAh, b.daily.consumptionAh);
        close(a.daily.chargeAh, b.daily.chargeAh);
        // Beyond the run counts as its end (a crossing at the very end may fall either side of it).
        const h = a.margin.coveredDays - 1;
        expect(Math.abs(days(a.routine.daysToCutoff, h) - days(b.routine.daysToCutoff, h))).toBeLessThanOrEqual(0.1);
        expect(Math.abs(days(a.parked.daysToCutoff, h) - days(b.parked.daysToCutoff, h))).toBeLessThanOrEqual(0.1);
      }),
      { numRuns: RUNS },
    );
  });
});
