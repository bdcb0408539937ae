import { describe, expect, it } from 'vitest';

import { sizeCableRun } from '@/shared/energy/wiring';
import { cableRunSizeSchema } from '@/shared/schemas/cable-run';
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
