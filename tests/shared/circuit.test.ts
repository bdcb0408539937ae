import { describe, expect, it } from 'vitest';

import { sizeCableRun } from '@/shared/energy/wiring';
import { CABLE_TYPES, cableRunFields, cableRunSchema, cableRunSizeSchema } from '@/shared/schemas/cable-run';
import { circuitSchema, circuitToRun } from '@/shared/schemas/circuit';

describe('Wire a circuit, as a cable run to size', () => {
  it('feeds a 300 W inverter as 31.75 A continuous at 3 %', () => {
    // 300 / (10.5 V × 0.9) = 31.75 A (REFERENCES, Inverters and their switching, common practice); 3 % (ABYC E-11, critical).
    const run = circuitToRun(circuitSchema.parse({ end: 'inverter', inverterW: 300, lengthM: 1.5 }));
    expect(run).toMatchObject({ currentA: 31.75, continuous: true, maxDropPercent: 3, purpose: 'inverter' });
  });

  it('derates a cable through the engine bay and takes the insulation from the cable type', () => {
    const run = cableRunSizeSchema.parse(circuitToRun(circuitSchema.parse({ currentA: 30, lengthM: 0.5, route: 'engine-bay', cableType: 'marine', maxDropPercent: 10 })));
    expect(run).toMatchObject({ engineSpace: true, insulationC: 105, maxDropPercent: 10 });
    // 33 CFR 183.425: 12 AWG at 105 °C carries 45 A, × 0.85 in an engine space = 38.25 A (REFERENCES, worked).
    const sized = sizeCableRun({ ...run, lengthM: 0.2 });
    expect(sized.awg).toBe('12');
    expect(sized.ampacityA).toBeCloseTo(38.25, 2);
  });

  it('names the missing figure for what is at the end of the wire', () => {
    const res = circuitSchema.safeParse({ end: 'inverter', lengthM: 2 });
    expect(res.success).toBe(false);
    expect(res.error!.issues.map((i) => i.path.join('.'))).toContain('inverterW');
  });
});

describe('one field list for both circuit forms', () => {
  it('gives Wire a circuit and a saved run every field of cableRunFields, and the server the same schema', () => {
    const fields = Object.keys(cableRunFields.shape);
    expect(fields).toEqual(['to', 'currentA', 'route', 'cableType', 'lengthM', 'returnPath', 'maxDropPercent', 'continuous', 'existingAwg']);
    for (const f of fields) {
      expect(Object.keys(circuitSchema.shape)).toContain(f);
      expect(Object.keys(cableRunSchema.shape)).toContain(f);
    }
    // A saved run's extras are only what saving needs; the calculator's only what a rig would otherwise say.
    expect(Object.keys(cableRunSchema.shape).filter((k) => !fields.includes(k))).toEqual(['label', 'from', 'loadId', 'inverterLink', 'purpose', 'existingMm2']);
    expect(Object.keys(circuitSchema.shape).filter((k) => !fields.includes(k))).toEqual(['systemVoltage', 'end', 'inverterW', 'efficiencyPercent']);
  });

  it('has one cable type per insulation column, so a run saved with only a rating has its type (migration 023)', () => {
    // The columns of 33 CFR 183.425 Table 5, the ratings the sizing schema takes.
    const ratings = Object.values(CABLE_TYPES).map((c) => c.insulationC);
    expect([...ratings].sort((a, b) => a - b)).toEqual([60, 75, 80, 90, 105, 125, 200]);
  });
});
