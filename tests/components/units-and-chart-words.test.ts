import { describe, expect, it } from 'vitest';

import { describeSoc, drivingBands, stopWhenFlat } from '@/components/charts/describe';
import { DEFAULT_UNITS, energyInText } from '@/components/units';
import { project } from '@/shared/energy/project';
import { WREN } from '@/shared/demo/scenario';
import { projectionInputSchema } from '@/shared/schemas/projection';

const WH = { ...DEFAULT_UNITS, energy: 'Wh' as const };

describe('energy in server texts', () => {
  it('leaves amp-hours as they are when Ah is chosen', () => {
    expect(energyInText('A battery bank of about 220 Ah (120 Ah more) covers it.', DEFAULT_UNITS, 24)).toBe('A battery bank of about 220 Ah (120 Ah more) covers it.');
  });

  it('turns every amp-hour figure into watt-hours at the system voltage, whatever the words around it', () => {
    // 1 Ah at 24 V is 24 Wh (energy = charge x voltage).
    expect(energyInText('A battery bank of about 220 Ah (120 Ah more) covers it.', WH, 24)).toBe('A battery bank of about 5,280 Wh (2,880 Wh more) covers it.');
    expect(energyInText('so the laptop cannot run then (1.5 Ah a day not served).', WH, 12)).toBe('so the laptop cannot run then (18 Wh a day not served).');
    expect(energyInText('About 1,200Ah in all', WH, 12)).toBe('About 14,400 Wh in all');
    expect(energyInText('Ahead: no figures here.', WH, 12)).toBe('Ahead: no figures here.');
  });
});

describe('the charge chart in words', () => {
  const p = project(projectionInputSchema.parse(WREN));

  it("names the weekday and hour of Wren's first point at or below the cut-off", () => {
    const first = p.series.find((s) => s.socPercent <= p.cutoffSocPercent)!;
    const day = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'][first.weekday];
    expect(describeSoc(p.series, p.cutoffSocPercent)).toContain(`On your routine the charge reaches the cut-off (${p.cutoffSocPercent} %) on ${day} about ${String(first.hourOfDay).padStart(2, '0')}:00`);
  });

  it('says a line stays above the cut-off when it does', () => {
    const high = p.series.map((s) => ({ ...s, socPercent: 90, parkedSocPercent: 90 }));
    expect(describeSoc(high, 50)).toMatch(/stays above the cut-off \(50 %\) for all 14 days, lowest 90 %\. Parked, not driving, the charge stays above/);
  });

  it('drops a line once it lies flat, and widens a short drive into a band that can be seen', () => {
    expect(stopWhenFlat([40, 10, 0, 0, 0, 5, 0, 0])).toEqual([40, 10, 0, undefined, undefined, 5, 0, undefined]);
    const series = p.series.map((s, i) => ({ ...s, drivingMinutes: i === 10 ? 40 : 0 }));
    const [band, ...rest] = drivingBands(series, 2);
    expect(rest).toEqual([]);
    // The 40 minutes from hour 10, widened to 2 hours about their middle.
    expect(band.to - band.from).toBeCloseTo(2, 9);
    expect((band.from + band.to) / 2).toBeCloseTo(10 + 20 / 60, 9);
  });
});
