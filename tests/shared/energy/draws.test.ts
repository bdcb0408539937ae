import { describe, expect, it } from 'vitest';

import { peukertHours } from '@/shared/energy/defaults';
import { project } from '@/shared/energy/project';
import { type LoadInput, projectionInputSchema } from '@/shared/schemas/projection';
import { bareRig } from './rigs';

describe('inverter draw: idle plus the AC loads while powered (the practitioners\' estimate)', () => {
  // A 48 W fridge on the inverter at 35 %: 48 / (12 × 0.9) = 4.444 A running, 1.556 A on average, 37.33 Ah a
  // day (REFERENCES.md, Inverters: W / (V × efficiency), 90 %, Home Power). It leaves the inverter powered all
  // day, so its 0.5 A idle counts all 24 hours: 12 Ah, whether the inverter is always on or switched for it.
  const fridge: LoadInput = { name: 'Fridge', supply: 'ac', watts: 48, dutyPercent: 35, hoursPerDay: 24 };
  const withControl = (control: 'always-on' | 'manual-switch') =>
    project(projectionInputSchema.parse(bareRig({ inverter: { ratedW: 300, idleA: 0.5, control }, loads: [fridge] })));

  it.each(['always-on', 'manual-switch'] as const)('%s: 12 Ah idle plus 37.33 Ah of fridge', (control) => {
    const p = withControl(control);
    expect(p.standby.inverterIdleAh).toBeCloseTo(12, 6);
    expect(p.breakdown.find((b) => b.name === 'Fridge')!.ahPerDay).toBeCloseTo(37.33, 2);
    expect(p.daily.consumptionAh).toBeCloseTo(49.33, 2);
  });
});

describe('Peukert follows the running current over its running time', () => {
  // A 1 kW microwave on the inverter for 15 minutes a day: 1000 / (12 × 0.9) = 92.59 A for 0.25 h = 23.15 Ah.
  // On a 100 Ah AGM (5 A 20-hour rate, k = 1.1 from memory) Peukert's law t = H (C / (I H))^k makes each
  // amp-hour at 92.59 A cost (92.59 / 5)^0.1 = 1.3390 (REFERENCES.md, Peukert's law): 30.99 Ah a day.
  const microwave = (over: Partial<LoadInput>, substeps = 1) =>
    project(
      projectionInputSchema.parse(bareRig({ inverter: { ratedW: 1500, idleA: 0, control: 'manual-switch' }, loads: [{ name: 'Microwave', supply: 'ac', watts: 1000, hoursPerDay: 0.25, ...over }] })),
      { substeps },
    );

  it('costs the same with or without a start hour, and at half the step', () => {
    const expected = 23.148 * Math.pow(92.593 / 5, 0.1);
    expect(expected).toBeCloseTo(30.99, 2);
    for (const p of [microwave({}), microwave({ startHour: 18 }), microwave({ startHour: 7 }, 2), microwave({}, 2)]) {
      expect(p.breakdown.find((b) => b.name === 'Microwave')!.ahPerDay).toBeCloseTo(30.99, 1);
      expect(p.daily.consumptionAh).toBeCloseTo(30.99, 1);
    }
  });

  it('matches the law itself for a steady draw: 100 Ah at 10 A and k = 1.2 lasts 20 (100 / 200)^1.2 = 8.706 h', () => {
    expect(peukertHours(100, 20, 10, 1.2)).toBeCloseTo(8.706, 3);
    const p = project(projectionInputSchema.parse(bareRig({ loads: [{ name: 'Heater', supply: 'dc', amps: 10, hoursPerDay: 24 }] }, { peukertExponent: 1.2 })), { substeps: 4 });
    expect(Math.abs(p.parked.daysToFlat! * 24 - 8.706)).toBeLessThan(0.13); // days are rounded to 0.01
  });
});
