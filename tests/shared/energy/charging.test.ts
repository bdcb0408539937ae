import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { chargeFor } from '@/shared/energy/charge';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { bareRig } from './rigs';

describe("the alternator's taper, integrated exactly", () => {
  // Flooded 100 Ah: bulk 0.2 C = 20 A (from memory), tapering linearly from 80 % to 0.02 C = 2 A at full
  // (from memory), charge efficiency 0.85 (common practice). In the taper with a surplus above the
  // acceptance, dAh/dt = 0.85 × (20 − 0.9 (Ah − 80)): the acceptance decays as 20 e^(−0.765 t).
  it('from 80 % for an hour: 80 + (20 − 20 e^−0.765) / 0.9 = 91.881 Ah', () => {
    const expected = 80 + (20 - 20 * Math.exp(-0.765)) / 0.9;
    expect(expected).toBeCloseTo(91.881, 3);
    expect(chargeFor(80, 30, 1, 0.85, 20, 2, 80, 100)).toBeCloseTo(expected, 9);
    // Full after ln(20 / 2) / 0.765 = 3.01 h.
    expect(chargeFor(80, 30, 3, 0.85, 20, 2, 80, 100)).toBeLessThan(100);
    expect(chargeFor(80, 30, 3.02, 0.85, 20, 2, 80, 100)).toBe(100);
  });

  it('gives the same through the model, and in two half-hour steps', () => {
    const p = (substeps: number) =>
      project(
        projectionInputSchema.parse(
          bareRig(
            { charging: { alternatorA: 30, charger: 'relay', relayJoinMinutes: 0, drivingMinutesPerDay: [60, 0, 0, 0, 0, 0, 0], drivingStartHour: 10 }, start: { weekday: 0, hour: 10 } },
            { chemistry: 'flooded', startSocPercent: 80 },
          ),
        ),
        { substeps, fixes: false },
      ).series[0].socPercent;
    expect(p(1)).toBeCloseTo(91.88, 2);
    expect(p(2)).toBeCloseTo(91.88, 2);
  });
});

describe('the charger choice matters', () => {
  // AGM 100 Ah at 85 %, 20 A from the alternator for an hour; bulk 0.3 C = 30 A (from memory), floor 2 A.
  const drive = (charger: 'relay' | 'dc-dc', chemistry: 'agm' | 'lifepo4' = 'agm') =>
    project(
      projectionInputSchema.parse(
        bareRig(
          { charging: { alternatorA: 20, charger, relayJoinMinutes: 0, drivingMinutesPerDay: [60, 0, 0, 0, 0, 0, 0], drivingStartHour: 10 }, start: { weekday: 0, hour: 10 } },
          { chemistry, startSocPercent: 85 },
        ),
      ),
      { fixes: false },
    );

  it('a relay leaves the AGM taper from 80 %: 96.72 %', () => {
    // Acceptance at 85 % is 30 − 1.4 × 5 = 23 A > 20 A: 18 Ah/h until it falls to 20 A at 87.14 % (0.119 h),
    // then 80 + (30 − 20 e^(−1.26 × 0.881)) / 1.4 = 96.72 %.
    expect(drive('relay').series[0].socPercent).toBeCloseTo(96.72, 1);
  });

  it('a DC-DC charger gives its rated current to 95 % (common practice): 99.73 %', () => {
    // 18 Ah/h to 95 % (0.556 h); then the taper from 95 %: slope 28 / 5 = 5.6 A per Ah, 18 Ah/h until the
    // acceptance is 20 A at 96.79 % (0.099 h), then 95 + (30 − 20 e^(−5.04 × 0.345)) / 5.6 = 99.73 %.
    expect(drive('dc-dc').series[0].socPercent).toBeCloseTo(99.73, 1);
  });

  it('a relay joins 5 minutes into each drive by default (13.7 V, REFERENCES.md: common practice)', () => {
    const p = project(
      projectionInputSchema.parse(bareRig({ charging: { alternatorA: 20, charger: 'relay', drivingMinutesPerDay: [30, 0, 0, 0, 0, 0, 0], drivingStartHour: 10 }, start: { weekday: 0, hour: 10 } }, { startSocPercent: 50 })),
      { fixes: false },
    );
    // 20 A × 25 min × 0.9 = 7.5 Ah.
    expect(p.series[0].socPercent).toBeCloseTo(57.5, 6);
    expect(p.assumptions.relayJoinMinutes).toBe(5);
  });

  it('warns about a LiFePO4 bank on a plain relay (alternator overheating: common practice)', () => {
    expect(drive('relay', 'lifepo4').warnings.map((w) => w.code)).toContain('lifepo4-on-relay');
    expect(drive('dc-dc', 'lifepo4').warnings.map((w) => w.code)).not.toContain('lifepo4-on-relay');
  });
});
