import { describe, expect, it } from 'vitest';

import { fixGainText, project } from '@/shared/energy/project';
import { STOAT } from '@/shared/demo/scenario';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { bareRig } from './rigs';

describe('the solar Fix is sized so the week balances in the steady state', () => {
  // LiFePO4 100 Ah, a constant 1.25 A (30 Ah a day), no driving. P watts of solar at 4 peak sun hours with
  // a 0.75 derate (common practice) give P × 4 × 0.75 / 12 Ah a day over 06:00 to 18:00 as a half sine.
  // Worked by hand: in each daylight hour the sun first runs the load, the rest is stored at 0.97 (LiFePO4,
  // common practice); the week balances when served + stored reaches the 30 Ah used each day.
  function neededWatts() {
    const weights = Array.from({ length: 12 }, (_, h) => Math.sin((Math.PI * (h + 0.5)) / 12));
    const sum = weights.reduce((a, b) => a + b, 0);
    for (let watts = 0; watts <= 3000; watts += 10) {
      const daily = (watts * 4 * 0.75) / 12;
      let served = 0;
      let stored = 0;
      for (const w of weights) {
        const amps = (daily * w) / sum;
        served += Math.min(amps, 1.25);
        stored += 0.97 * Math.max(0, amps - 1.25);
      }
      if (served + stored >= 30) return watts;
    }
    return null;
  }
  const p = project(projectionInputSchema.parse(bareRig({ loads: [{ name: 'Fridge', supply: 'dc', amps: 1.25, hoursPerDay: 24 }] }, { chemistry: 'lifepo4', cutoffSocPercent: 20 })));
  const solar = p.fixes.find((f) => f.kind === 'solar')!;

  it('offers the watts worked by hand, at which the routine holds', () => {
    const watts = neededWatts()!;
    expect(watts).toBeGreaterThan(120);
    expect(solar.figures.solarW).toBe(watts);
    expect(solar.summary).toContain(`${watts} W`);
    expect(solar.holds).toBe(true);
  });

  it('reads "outlasts the horizon" where the gain reaches the end of the run, never the horizon as days', () => {
    expect(solar.outlastsHorizon).toEqual({ parked: true, routine: true });
    expect(fixGainText(solar)).toBe('the routine holds, outlasts the horizon parked');
    expect(fixGainText({ ...solar, holds: false })).toBe('outlasts the horizon on your routine, outlasts the horizon parked');
  });
});

describe('a Fix that stops a parked AC load says which, when and how much', () => {
  // An essential CPAP on the inverter, 30 W for 8 h from 23:00: 30 / (12 × 0.9) = 2.778 A, 22.22 Ah a night;
  // the inverter idles at 0.5 A (12 Ah a day). 100 Ah AGM from full, cut-off 50 %.
  const p = project(
    projectionInputSchema.parse(
      bareRig({
        inverter: { ratedW: 300, idleA: 0.5, control: 'always-on' },
        loads: [{ name: 'CPAP', supply: 'ac', watts: 30, hoursPerDay: 8, startHour: 23, when: 'parked', essential: true }],
      }),
    ),
  );

  it('an ignition relay stops the CPAP whenever parked: 22.22 Ah a day not served, and it is essential', () => {
    const fix = p.fixes.find((f) => f.kind === 'ignition-relay')!;
    expect(fix.stops).toMatchObject({ loads: ['CPAP'], essentialLoads: ['CPAP'], when: 'parked', fromDay: 0 });
    expect(fix.stops!.ahPerDayNotServed).toBeCloseTo(22.22, 2);
    expect(fix.cutsEssential).toBe(true);
    expect(fix.convenience).toContain('essential');
  });

  it('a low-voltage disconnect stops it once the battery falls to 60 %, on day 1.07', () => {
    // 40 Ah to 60 %: 0:00 to 7:00 at 3.278 A (22.94 Ah), 7:00 to 23:00 at 0.5 A (8 Ah), then 9.06 Ah at 3.278 A:
    // 25.76 h = 1.07 days. With nothing to charge the battery the disconnect never closes again, so in the
    // repeating week none of the CPAP's 22.22 Ah a night is served.
    const fix = p.fixes.find((f) => f.kind === 'low-voltage-disconnect')!;
    expect(fix.stops).toMatchObject({ loads: ['CPAP'], essentialLoads: ['CPAP'], when: 'low-battery' });
    expect(fix.stops!.fromDay).toBeCloseTo(1.07, 2);
    expect(fix.stops!.ahPerDayNotServed).toBeCloseTo(22.22, 2);
    expect(fix.cutsEssential).toBe(true);
  });

  it('a cut-off switch stops nothing', () => {
    const fix = p.fixes.find((f) => f.kind === 'cutoff-switch')!;
    expect(fix.stops).toBeNull();
    expect(fix.cutsEssential).toBe(false);
  });
});

describe('more battery on a starting battery', () => {
  it('recommends a separate house battery with split charging, not a bigger starter', () => {
    const p = project(projectionInputSchema.parse(STOAT));
    expect(p.fixes.map((f) => f.kind)).not.toContain('more-battery');
    const fix = p.fixes.find((f) => f.kind === 'house-battery')!;
    expect(fix.summary).toMatch(/separate house battery of about \d+ Ah with split charging/);
    expect(fix.change).toMatchObject({ battery: { role: 'house' } });
  });
});
