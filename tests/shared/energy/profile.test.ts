import * as fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import {
  AC_A,
  AC_ACTIVE,
  AC_WATTS,
  buildDemandProfile,
  DC_A,
  DRIVING,
  HOUR_STRIDE,
  HOURS_PER_WEEK,
  loadRunningCurrentA,
  PARKED,
} from '@/shared/energy/profile';
import { resolve } from '@/shared/energy/resolve';
import { run } from '@/shared/energy/run';
import { type Load, loadSchema, projectionInputSchema } from '@/shared/schemas/projection';

// The model keeps a load's schedule as its daily window and adds loads spread over the day per day, for
// speed. These tests hold that against the plain definition (docs/model.md, "Loads"), written out here
// hour by hour over the week: a window of hoursPerDay from startHour on each weekday (the last hour by its
// fraction), or hoursPerDay / 24 of every hour without a start hour; a "driving" load on whenever driven.

function scheduled(load: Load): number[] {
  const on = new Array<number>(HOURS_PER_WEEK).fill(0);
  for (const day of new Set(load.weekdays ?? [0, 1, 2, 3, 4, 5, 6])) {
    if (load.startHour === undefined) {
      for (let h = 0; h < 24; h++) on[day * 24 + h] += load.hoursPerDay / 24;
      continue;
    }
    let left = load.hoursPerDay;
    for (let t = day * 24 + load.startHour; left > 1e-12; t++) {
      on[t % HOURS_PER_WEEK] += Math.min(1, left);
      left -= Math.min(1, left);
    }
  }
  return on.map((x) => Math.min(1, x));
}

function plainProfile(loads: Load[], volts: number, efficiency: number) {
  const table = new Array<number>(HOURS_PER_WEEK * HOUR_STRIDE).fill(0);
  for (const load of loads) {
    const amps = loadRunningCurrentA(load, volts, efficiency) * (load.dutyPercent / 100);
    const watts = load.watts !== undefined ? load.watts * load.quantity : loadRunningCurrentA(load, volts, efficiency) * volts * efficiency;
    const on = scheduled(load);
    for (let h = 0; h < HOURS_PER_WEEK; h++) {
      const parts: [number, number][] = [
        [PARKED, load.when === 'driving' ? 0 : on[h]],
        [DRIVING, load.when === 'parked' ? 0 : load.when === 'driving' ? 1 : on[h]],
      ];
      for (const [part, x] of parts) {
        if (x === 0) continue;
        const at = h * HOUR_STRIDE + part;
        if (load.supply === 'dc') {
          table[at + DC_A] += amps * x;
          continue;
        }
        table[at + AC_A] += amps * x;
        table[at + AC_ACTIVE] = Math.max(table[at + AC_ACTIVE], x);
        table[at + AC_WATTS] += watts;
      }
    }
  }
  return table;
}

const loadArb = fc
  .record(
    {
      name: fc.constantFrom('Fridge', 'Lights', 'Fan', 'Laptop', 'Pump'),
      supply: fc.constantFrom('dc', 'ac'),
      watts: fc.integer({ min: 1, max: 400 }),
      dutyPercent: fc.integer({ min: 1, max: 100 }),
      hoursPerDay: fc.oneof(fc.integer({ min: 0, max: 24 }), fc.double({ min: 0, max: 24, noNaN: true })),
      startHour: fc.option(fc.integer({ min: 0, max: 23 }), { nil: undefined }),
      weekdays: fc.option(fc.array(fc.integer({ min: 0, max: 6 }), { minLength: 1, maxLength: 7 }), { nil: undefined }),
      when: fc.constantFrom('always', 'parked', 'driving'),
      quantity: fc.integer({ min: 1, max: 3 }),
    },
    { requiredKeys: ['name', 'supply', 'watts', 'hoursPerDay'] },
  )
  .map((raw) => loadSchema.parse(raw));

describe('buildDemandProfile', () => {
  it('equals the hour-by-hour definition for any loads', () => {
    fc.assert(
      fc.property(fc.array(loadArb, { maxLength: 8 }), (loads) => {
        const fast = buildDemandProfile(loads, 12, 0.9).byHour;
        const plain = plainProfile(loads, 12, 0.9);
        let worst = 0;
        for (let i = 0; i < plain.length; i++) worst = Math.max(worst, Math.abs(fast[i] - plain[i]));
        expect(fast).toHaveLength(plain.length);
        expect(worst).toBeLessThan(1e-9);
      }),
      { numRuns: 300 },
    );
  });

  it('knows which loads run while parked', () => {
    fc.assert(
      fc.property(loadArb, (load) => {
        const [lp] = buildDemandProfile([load], 12, 0.9).loads;
        expect(lp.runsParked).toBe(load.when !== 'driving' && scheduled(load).some((x) => x > 0));
      }),
      { numRuns: 300 },
    );
  });
});

describe('run: the amp-hours of each load over the first week', () => {
  it('equal the hours it was on times its current, hour by hour, with the inverter always on', () => {
    fc.assert(
      fc.property(fc.array(loadArb, { minLength: 1, maxLength: 6 }), fc.array(fc.integer({ min: 0, max: 300 }), { minLength: 7, maxLength: 7 }), (loads, minutes) => {
        const input = projectionInputSchema.parse({
          // Peukert's exponent 1: no extra amp-hours here (Peukert per load is checked in peukert.test.ts).
          battery: { chemistry: 'agm', capacityAh: 200, peukertExponent: 1 },
          inverter: { ratedW: 3000, idleA: 0.5, control: 'always-on' },
          loads,
          charging: { alternatorA: 30, drivingMinutesPerDay: minutes },
        });
        const r = resolve(input);
        const week = run(r, buildDemandProfile(input.loads, 12, 0.9), { withDriving: true, trackWeek: true, hours: HOURS_PER_WEEK }).week!;
        input.loads.forEach((load, i) => {
          const amps = loadRunningCurrentA(load, 12, 0.9) * (load.dutyPercent / 100);
          const on = scheduled(load);
          let ah = 0;
          for (let t = 0; t < HOURS_PER_WEEK; t++) {
            const h = (r.startHourOfWeek + t) % HOURS_PER_WEEK;
            const driven = r.driving[h];
            const parkedOn = load.when === 'driving' ? 0 : on[h];
            const drivingOn = load.when === 'parked' ? 0 : load.when === 'driving' ? 1 : on[h];
            ah += amps * (parkedOn * (1 - driven) + drivingOn * driven);
          }
          expect(week.perLoadAh[i]).toBeCloseTo(ah, 9);
        });
      }),
      { numRuns: 200 },
    );
  });
});
