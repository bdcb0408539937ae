import { describe, expect, it } from 'vitest';

import { explainAssumptions } from '@/shared/energy/assumptions';
import { project } from '@/shared/energy/project';
import { STOAT, WREN } from '@/shared/demo/scenario';
import { projectionInputSchema, rigPowerSchema } from '@/shared/schemas/projection';

function explain(raw: object) {
  const input = projectionInputSchema.parse(raw);
  const p = project(input, { fixes: false });
  return Object.fromEntries(explainAssumptions(rigPowerSchema.parse(raw), p.assumptions, p.horizonDays).map((a) => [a.key, a]));
}

describe('how the figure was worked out', () => {
  it('lists every assumption of Wren with its value and source', () => {
    const a = explain(WREN);
    // Cut-off: about 50 % depth of discharge for lead-acid (common practice).
    expect(a.cutoff).toMatchObject({ value: '50 %', changeOn: 'outlook' });
    expect(a.cutoff.source).toContain('common practice');
    // 22 °C between 0 °C (0.75) and 25 °C (1.0): 0.97 (US Army TM 10-6140-200-14, 1-9a).
    expect(a.temperature.value).toBe('0.97 at 22 °C');
    expect(a.temperature.source).toContain('TM 10-6140-200-14');
    expect(a.peukert.source).toContain('from memory');
    expect(a['self-discharge'].source).toContain('Darling');
    expect(a['inverter-efficiency'].source).toContain('Home Power');
    expect(a.routine.value).toContain('Your own routine: 40 min on Wed from 11:00');
    expect(a.stay.value).toBe('5 days');
    expect(a.horizon.value).toContain('14 days');
    for (const x of Object.values(a)) expect(x.source.length).toBeGreaterThan(3);
  });

  it('names the starting battery\'s cranking reserve and a setting the user made', () => {
    expect(explain(STOAT).cutoff.source).toContain('cranking reserve');
    const own = explain({ ...WREN, battery: { ...WREN.battery, cutoffSocPercent: 40 } });
    expect(own.cutoff).toMatchObject({ value: '40 %', source: 'your setting' });
  });
});
