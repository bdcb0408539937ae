import { describe, expect, it } from 'vitest';

import { CHEMISTRY_DEFAULTS, starterCutoffSoc, temperatureFactor } from '@/shared/energy/defaults';
import { project } from '@/shared/energy/project';
import { leadAcidFreezingC } from '@/shared/energy/warnings';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { bareRig } from './rigs';

const codes = (p: ReturnType<typeof project>) => p.warnings.map((w) => w.code);

describe('LiFePO4 below 0 °C takes no charge', () => {
  // REFERENCES.md, Cold and charging: LiFePO4 must not be charged below 0 °C; its protection system blocks
  // charging there (common practice). At -5 °C LiFePO4 keeps 0.9 − 0.2 × 5 / 20 = 0.85 of its capacity
  // (from memory, defaults.ts): 85 Ah usable. A 1 A load; a DC-DC charger of 20 A on a 2-hour drive at 10:00.
  const frozen = (battery = {}) =>
    project(
      projectionInputSchema.parse(
        bareRig(
          {
            loads: [{ name: 'Lamp', supply: 'dc', amps: 1, hoursPerDay: 24 }],
            charging: { alternatorA: 20, charger: 'dc-dc', drivingMinutesPerDay: [120, 120, 120, 120, 120, 120, 120], drivingStartHour: 10 },
          },
          { chemistry: 'lifepo4', temperatureC: -5, startSocPercent: 50, cutoffSocPercent: 20, ...battery },
        ),
      ),
    );

  it('stores nothing from a daily drive: the alternator only runs the load while it drives', () => {
    const p = frozen();
    expect(p.assumptions.usableAh).toBeCloseTo(85, 6);
    // Day one: 42.5 Ah, less 1 A for the 22 parked hours = 20.5 Ah = 24.12 % at midnight.
    expect(p.series[23].socPercent).toBeCloseTo((20.5 / 85) * 100, 2);
    // 42.5 − 17 Ah to the 20 % cut-off = 25.5 Ah: 10 Ah by 10:00, 15.5 Ah after 12:00, so at 27.5 h.
    expect(p.routine.daysToCutoff).toBeCloseTo(27.5 / 24, 2);
    expect(p.routine.holds).toBe(false);
    expect(codes(p)).toContain('lifepo4-cold-charge');
    // The week's offer (20 A × 14 h = 280 Ah) runs the load while driving (14 Ah); the rest is not stored.
    expect(p.balance.offeredAh).toBeCloseTo(280, 6);
    expect(p.balance.putBackAh).toBeCloseTo(14, 6);
  });

  it('a self-heating battery charges after its heater has warmed it, and the heater counts', () => {
    // The heater: 50 W (4.167 A at 12 V) for 60 minutes of each charge (from memory). The second hour
    // stores (20 − 1) A × 0.97 (LiFePO4 charge efficiency, common practice) = 18.43 Ah.
    const p = frozen({ selfHeating: true });
    expect(p.series[23].socPercent).toBeCloseTo(((20.5 + 18.43) / 85) * 100, 2);
    expect(p.balance.heatingAh).toBeCloseTo((7 * 50) / 12, 2);
    expect(p.warnings.find((w) => w.code === 'lifepo4-cold-charge')?.figures).toMatchObject({ heaterW: 50, warmupMinutes: 60 });
  });

  it('a cold lead-acid battery accepts less: at 0 °C its 0.3 C bulk acceptance falls with its capacity to 22.5 A', () => {
    // Model choice (docs/model.md): acceptance × the capacity factor, 0.75 at 0 °C (US Army TM 10-6140-200-14, 1-9a).
    // 75 Ah usable from 20 %: 22.5 A × 1 h × 0.9 = 20.25 Ah = 27 points, to 47 %.
    const p = project(
      projectionInputSchema.parse(
        bareRig(
          { charging: { alternatorA: 40, charger: 'dc-dc', drivingMinutesPerDay: [60, 0, 0, 0, 0, 0, 0], drivingStartHour: 0 } },
          { temperatureC: 0, startSocPercent: 20, cutoffSocPercent: 10 },
        ),
      ),
    );
    expect(p.series[0].socPercent).toBeCloseTo(47, 6);
  });
});

describe('cold starting batteries', () => {
  it('raise the cranking reserve as the cranking power falls (TM 5-4210-230-14&P-1 Table 3)', () => {
    // Cranking power 65 % at 0 °C, 40 % at -18 °C, 20 % at -29 °C; the 75 % reserve at 27 °C keeps its
    // 25-point depth times that share (model choice): 83.75 %, 90 %, 95 %.
    expect(starterCutoffSoc(75, 27)).toBeCloseTo(75, 9);
    expect(starterCutoffSoc(75, 0)).toBeCloseTo(83.75, 9);
    expect(starterCutoffSoc(75, -18)).toBeCloseTo(90, 9);
    expect(starterCutoffSoc(75, -29)).toBeCloseTo(95, 9);
    const p = project(projectionInputSchema.parse(bareRig({}, { chemistry: 'flooded', role: 'starter', temperatureC: -18, cutoffSocPercent: undefined })));
    expect(p.cutoffSocPercent).toBeCloseTo(90, 6);
  });

  it('keep losing capacity below -18 °C instead of staying at 40 %', () => {
    // 0.40 at -18 °C (US Army TM 10-6140-200-14, 1-9a); 0.20 at -29 °C in proportion to the cranking power
    // of TM 5-4210-230-14&P-1 Table 3 (model choice); -23.5 °C lies half way: 0.30.
    const curve = CHEMISTRY_DEFAULTS.flooded.temperatureCurve;
    expect(temperatureFactor(curve, -18)).toBeCloseTo(0.4, 9);
    expect(temperatureFactor(curve, -23.5)).toBeCloseTo(0.3, 9);
    expect(temperatureFactor(curve, -29)).toBeCloseTo(0.2, 9);
    expect(temperatureFactor(curve, -35)).toBeLessThan(0.2);
  });

  it('warn that a discharged lead-acid battery can freeze in hard frost', () => {
    // Flat, the electrolyte freezes near -8 °C; full, near -60 °C (REFERENCES.md, from memory).
    expect(leadAcidFreezingC(0)).toBeCloseTo(-8, 9);
    expect(leadAcidFreezingC(100)).toBeCloseTo(-60, 9);
    // A 2 A load drains a flooded battery at -10 °C to flat within the horizon: it may freeze.
    const drained = project(projectionInputSchema.parse(bareRig({ loads: [{ name: 'Heater fan', supply: 'dc', amps: 2, hoursPerDay: 24 }] }, { chemistry: 'flooded', temperatureC: -10 })));
    expect(codes(drained)).toContain('lead-acid-may-freeze');
    // Kept full (no loads), the same battery is safe at -10 °C.
    const kept = project(projectionInputSchema.parse(bareRig({}, { chemistry: 'flooded', temperatureC: -10 })));
    expect(codes(kept)).not.toContain('lead-acid-may-freeze');
  });
});
