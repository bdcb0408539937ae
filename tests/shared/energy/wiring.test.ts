import * as fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import {
  abycCircularMils,
  AWG_SIZES,
  awgAmpacity,
  awgAreaMm2,
  awgDiameterMm,
  awgOhmPerM,
  fuseKindOf,
  iacsOhmPerM,
  maximumProtectionA,
  minimumProtectionA,
  mm2OhmPerM,
  MM2_SIZES,
  NoConductorError,
  saeSizeFor,
  sizeCableRun,
  standardRating,
} from '@/shared/energy/wiring';
import { cableRunSizeSchema, type CableRunSizeForm } from '@/shared/schemas/cable-run';

const FT = 0.3048;
const size = (form: CableRunSizeForm) => sizeCableRun(cableRunSizeSchema.parse(form));
const within = (actual: number, expected: number, share = 0.01) => expect(Math.abs(actual - expected) / expected).toBeLessThanOrEqual(share);

describe('conductor resistance', () => {
  // NEC (NFPA 70) Chapter 9, Table 8, uncoated stranded copper at 75 °C, ohms per 1000 ft (REFERENCES.md).
  const necStranded: [string, number][] = [
    ['18', 7.95], ['16', 4.99], ['14', 3.14], ['12', 1.98], ['10', 1.24], ['8', 0.778], ['6', 0.491],
    ['4', 0.308], ['2', 0.194], ['1', 0.154], ['1/0', 0.122], ['2/0', 0.0967], ['4/0', 0.0608],
  ];
  it.each(necStranded)('%s AWG stranded is %f ohm per 1000 ft at 75 °C (NEC Chapter 9, Table 8)', (awg, ohm) => {
    within(awgOhmPerM(awg as (typeof AWG_SIZES)[number], 75) * 1000 * FT, ohm);
  });

  // NEC Chapter 9, Table 8, solid: 14 AWG 3.07, 12 AWG 1.93, 10 AWG 1.21, 8 AWG 0.764 (REFERENCES.md),
  // reproduced from first principles: ASTM B258 diameter, IACS resistivity 1.7241e-8 ohm m at 20 °C and
  // 0.00393 per °C (IEC 60028).
  const necSolid: [string, number][] = [['14', 3.07], ['12', 1.93], ['10', 1.21], ['8', 0.764]];
  it.each(necSolid)('%s AWG solid is %f ohm per 1000 ft at 75 °C from ASTM B258 and IACS copper', (awg, ohm) => {
    within(iacsOhmPerM(awgAreaMm2(awg as (typeof AWG_SIZES)[number]), 75) * 1000 * FT, ohm);
  });

  it('gives 10 AWG a 2.588 mm diameter, 5.261 mm², 0.999 ohm per 1000 ft at 20 °C and 1.21 at 75 °C', () => {
    // REFERENCES.md, Copper conductors: the ASTM B258 / IACS check values.
    expect(awgDiameterMm('10')).toBeCloseTo(2.588, 3);
    expect(awgAreaMm2('10')).toBeCloseTo(5.261, 2);
    within(iacsOhmPerM(awgAreaMm2('10'), 20) * 1000 * FT, 0.999);
    within(iacsOhmPerM(awgAreaMm2('10'), 75) * 1000 * FT, 1.21);
  });

  it('follows ASTM B258 at both ends of the series: 36 AWG is 0.127 mm and 0000 (4/0) 11.68 mm', () => {
    // d = 0.127 mm × 92^((36 − n) / 39); 4/0 is n = −3: 0.127 × 92^1 = 11.684 mm.
    expect(awgDiameterMm('4/0')).toBeCloseTo(11.684, 2);
    expect(0.127 * Math.pow(92, 0)).toBe(0.127);
  });

  // IEC 60228, class 5 flexible plain copper, maximum ohm/km at 20 °C (REFERENCES.md).
  const iecClass5: [number, number][] = [[1.5, 13.3], [2.5, 7.98], [4, 4.95], [6, 3.3], [10, 1.91], [16, 1.21], [25, 0.78], [35, 0.554], [50, 0.386]];
  it.each(iecClass5)('%f mm² flexible is %f ohm per km at 20 °C (IEC 60228 class 5)', (mm2, ohm) => {
    within(mm2OhmPerM(mm2, 20) * 1000, ohm);
  });

  it("moves an IEC value to 75 °C with IEC 60228's k = 254.5 / (234.5 + t)", () => {
    expect(mm2OhmPerM(2.5, 75) / mm2OhmPerM(2.5, 20)).toBeCloseTo((234.5 + 75) / 254.5, 6);
  });

  it("moves an NEC value with its note R2 = R1 (1 + 0.00323 (T2 − 75)): 10 AWG at 20 °C is 1.24 × 0.822 = 1.020", () => {
    within(awgOhmPerM('10', 20) * 1000 * FT, 1.24 * (1 + 0.00323 * (20 - 75)));
  });
});

describe('voltage drop, the worked examples', () => {
  it('sizes 10 A at 12 V over a 21 ft round trip: 10 AWG at 3 %, 16 AWG at 10 %', () => {
    // REFERENCES.md, Voltage drop (ABYC E-11): 10.75 × 10 × 25 / 0.36 = 7465 cmil: 10 AWG; at 10 %, 2240 cmil: 16 AWG.
    expect(size({ currentA: 10, lengthM: 10.5 * FT, maxDropPercent: 3, insulationC: 60 }).awg).toBe('10');
    expect(size({ currentA: 10, lengthM: 10.5 * FT, maxDropPercent: 10, insulationC: 60 }).awg).toBe('16');
  });

  it("reproduces ABYC's relation CM = K × I × L / E on the SAE areas (K = 10.75, from memory)", () => {
    expect(abycCircularMils(10, 25, 0.36)).toBeCloseTo(7465, 0);
    expect(saeSizeFor(7465)).toBe('10');
    expect(abycCircularMils(10, 25, 1.2)).toBeCloseTo(2240, 0);
    expect(saeSizeFor(2240)).toBe('16');
  });

  it('drops 1.24 V (10.3 %) on 10 AWG and 0.308 V (2.57 %) on 4 AWG for 20 A over 25 ft one way', () => {
    // REFERENCES.md, Voltage drop (NEC Table 8, 75 °C): 50 ft of conductor.
    const ten = size({ currentA: 20, lengthM: 25 * FT, maxDropPercent: 11 });
    expect(ten.awg).toBe('10');
    expect(ten.dropV).toBeCloseTo(1.24, 2);
    expect(ten.dropPercent).toBeCloseTo(10.33, 1);
    const four = size({ currentA: 20, lengthM: 25 * FT, maxDropPercent: 3 });
    expect(four.awg).toBe('4');
    expect(four.dropV).toBeCloseTo(0.308, 3);
    expect(four.dropPercent).toBeCloseTo(2.57, 2);
    expect(four.nextSmaller).toMatchObject({ awg: '6', fails: ['drop'] });
  });

  it('drops 0.798 V (6.65 %) on 2.5 mm² and 0.330 V (2.75 %) on 6 mm² for 10 A over 10 m of conductor at 20 °C', () => {
    // REFERENCES.md, Voltage drop (IEC 60228 class 5, 20 °C).
    const small = size({ currentA: 10, lengthM: 5, maxDropPercent: 7, conductorTemperatureC: 20 });
    expect(small.metric.mm2).toBe(2.5);
    expect(small.metric.dropV).toBeCloseTo(0.798, 3);
    expect(small.metric.dropPercent).toBeCloseTo(6.65, 2);
    const six = size({ currentA: 10, lengthM: 5, maxDropPercent: 3, conductorTemperatureC: 20 });
    expect(six.metric.mm2).toBe(6);
    expect(six.metric.dropV).toBeCloseTo(0.33, 3);
    expect(six.metric.dropPercent).toBeCloseTo(2.75, 2);
  });

  it('counts only the positive length on a chassis return, plus the ground allowance, and says so', () => {
    const cable = size({ currentA: 20, lengthM: 3, maxDropPercent: 3 });
    const chassis = size({ currentA: 20, lengthM: 3, maxDropPercent: 3, returnPath: 'chassis' });
    expect(chassis.conductorLengthM).toBe(3);
    expect(cable.conductorLengthM).toBe(6);
    // 8 AWG at 75 °C: 0.778 / 304.8 ohm/m × 3 m × 20 A = 0.153 V, plus 20 A × 1 mΩ = 0.020 V.
    const eight = size({ currentA: 20, lengthM: 3, maxDropPercent: 1.5, returnPath: 'chassis' });
    expect(eight.awg).toBe('8');
    expect(eight.dropV).toBeCloseTo(0.153 + 0.02, 3);
    expect(chassis.cautions[0]).toMatch(/ground point/);
  });
});

describe('ampacity and protection', () => {
  it('gives 12 AWG 105 °C wire 45 A outside an engine space, protection up to 67.5 A; 38.25 A inside, up to 57.4 A', () => {
    // 33 CFR 183.425 Table 5 and its 0.85 engine-space factor; 33 CFR 183.455: up to 150 % under 50 V.
    expect(awgAmpacity('12', 105, false)).toBe(45);
    expect(maximumProtectionA(45, 12)).toBe(67.5);
    expect(awgAmpacity('12', 105, true)).toBeCloseTo(38.25, 2);
    expect(maximumProtectionA(38.25, 12)).toBeCloseTo(57.4, 1);
  });

  it('gives a continuous 12 A load at least 15 A protection', () => {
    // NEC 210.20(A): 125 % of the continuous load; 15 A is the next standard rating (NEC 240.6(A)).
    expect(minimumProtectionA(12, true)).toBe(15);
    expect(standardRating(15, 100)).toBe(15);
    expect(size({ currentA: 12, lengthM: 1, continuous: true }).fuseA).toBe(15);
    expect(size({ currentA: 12, lengthM: 1, continuous: false }).fuseA).toBe(15);
    expect(size({ currentA: 11, lengthM: 1, continuous: false }).fuseA).toBe(15);
    expect(size({ currentA: 7, lengthM: 1, continuous: false }).fuseA).toBe(7.5); // blade fuse series
  });

  it('uses the Table 5 columns by insulation rating (16 AWG: 15 A at 60 °C, 35 A at 200 °C)', () => {
    expect(awgAmpacity('16', 60, false)).toBe(15);
    expect(awgAmpacity('16', 200, false)).toBe(35);
    expect(awgAmpacity('4/0', 75, false)).toBe(360);
  });

  it('goes up a conductor when no standard rating fits between the need and the wire limit', () => {
    // 60 °C wire at 30 A continuous: 37.5 A needed; 10 AWG carries 40 A so it may take up to 60 A; fine.
    // 10 A at 500 V-free 12 V: a short run fits 16 AWG; the chosen size always has a fuse.
    const r = size({ currentA: 40, lengthM: 0.3, maxDropPercent: 10, insulationC: 60, continuous: true });
    expect(r.fuseA).toBeGreaterThanOrEqual(50);
    expect(r.fuseA).toBeLessThanOrEqual(r.protection.maximumA);
  });

  it('recommends a manual-reset breaker on an inverter feed and warns off automatic reset', () => {
    const r = size({ currentA: 30, lengthM: 1, purpose: 'inverter' });
    expect(r.breaker.standard).toBe('SAE J553');
    expect(r.breaker.advice).toMatch(/cut-off switch/);
    expect(r.breaker.advice).toMatch(/type I/);
    expect(r.protection.placement).toMatch(/7 in/);
  });

  it('always shows the cautions and defers to local codes and an auto electrician', () => {
    const r = size({ currentA: 5, lengthM: 1 });
    expect(r.cautions.join(' ')).toMatch(/local codes/);
    expect(r.cautions.join(' ')).toMatch(/auto electrician/);
    expect(r.cautions.join(' ')).toMatch(/Disconnect the battery/);
  });

  it('says plainly when no conductor in the table carries the current', () => {
    expect(() => size({ currentA: 900, lengthM: 5 })).toThrow(NoConductorError);
  });
});

describe('sizing properties', () => {
  const runArb = fc.record({
    systemVoltage: fc.constantFrom(12, 24),
    currentA: fc.double({ min: 0.5, max: 150, noNaN: true }),
    lengthM: fc.double({ min: 0.2, max: 8, noNaN: true }),
    maxDropPercent: fc.constantFrom(3, 5, 10),
    insulationC: fc.constantFrom(60, 75, 90, 105, 125),
    engineSpace: fc.boolean(),
    returnPath: fc.constantFrom('cable', 'chassis'),
    continuous: fc.boolean(),
  }) as fc.Arbitrary<CableRunSizeForm>;
  const idx = (awg: string) => AWG_SIZES.indexOf(awg as (typeof AWG_SIZES)[number]);
  const tryRun = (f: CableRunSizeForm) => {
    try {
      return size(f);
    } catch (e) {
      if (e instanceof NoConductorError) return null;
      throw e;
    }
  };

  it('never gives a smaller conductor for a longer run or a larger current', () => {
    fc.assert(
      fc.property(runArb, fc.double({ min: 1, max: 3, noNaN: true }), fc.boolean(), (f, k, longer) => {
        const a = tryRun(f);
        const b = tryRun(longer ? { ...f, lengthM: f.lengthM! * k } : { ...f, currentA: f.currentA! * k });
        if (!a) {
          expect(b).toBeNull();
          return;
        }
        if (!b) return;
        expect(idx(b.awg)).toBeGreaterThanOrEqual(idx(a.awg));
        expect(MM2_SIZES.indexOf(b.mm2 as (typeof MM2_SIZES)[number])).toBeGreaterThanOrEqual(MM2_SIZES.indexOf(a.mm2 as (typeof MM2_SIZES)[number]));
      }),
      { numRuns: 300 },
    );
  });

  it('always picks a size that meets the drop, carries the current and has a fuse, while the next smaller fails one', () => {
    fc.assert(
      fc.property(runArb, (f) => {
        const r = tryRun(f);
        if (!r) return;
        const input = cableRunSizeSchema.parse(f);
        expect(r.dropPercent).toBeLessThanOrEqual(input.maxDropPercent + 1e-6);
        expect(r.ampacityA).toBeGreaterThanOrEqual(input.currentA!);
        expect(r.fuseA).toBeGreaterThanOrEqual(minimumProtectionA(input.currentA!, input.continuous) - 1e-9);
        expect(r.fuseA).toBeLessThanOrEqual(r.protection.maximumA + 1e-9);
        if (r.nextSmaller) expect(r.nextSmaller.fails.length).toBeGreaterThan(0);
        if (r.metricNextSmaller) expect(r.metricNextSmaller.fails.length).toBeGreaterThan(0);
      }),
      { numRuns: 300 },
    );
  });
});

describe('a run that feeds the inverter is sized from the inverter', () => {
  it('takes the rated watts at the 10.5 V cut-out through the efficiency, as a continuous load', () => {
    // Small 12 V inverters cut out at about 10.5 V (REFERENCES.md, common practice); 90 % efficiency (Home
    // Power). 1000 W: 1000 / (10.5 × 0.9) = 105.8 A, continuous: protection at least 125 % (NEC 210.20(A)) = 132.3 A.
    const r = size({ systemVoltage: 12, inverterW: 1000, purpose: 'inverter', lengthM: 1.5, maxDropPercent: 3, insulationC: 105 });
    expect(r.currentA).toBeCloseTo(105.82, 2);
    expect(r.basis).toEqual({ inverterW: 1000, cutoutV: 10.5, efficiencyPercent: 90, continuous: true });
    expect(r.protection.minimumA).toBeCloseTo(132.28, 2);
    expect(r.fuseA).toBe(150); // the next NEC 240.6(A) standard rating
    expect(r.fuseKind).toMatch(/Bolt-down/);
    // 24 V: the cut-out scales to 21 V, so half the current.
    const r24 = size({ systemVoltage: 24, inverterW: 1000, purpose: 'inverter', lengthM: 1.5, maxDropPercent: 3, insulationC: 105 });
    expect(r24.currentA).toBeCloseTo(52.91, 2);
  });

  it('asks for the inverter purpose and for either a current or watts', () => {
    expect(cableRunSizeSchema.safeParse({ inverterW: 300, lengthM: 1 }).success).toBe(false);
    expect(cableRunSizeSchema.safeParse({ inverterW: 300, currentA: 5, purpose: 'inverter', lengthM: 1 }).success).toBe(false);
    expect(cableRunSizeSchema.safeParse({ lengthM: 1 }).success).toBe(false);
  });
});

describe('fuses named truly', () => {
  it('a 6 A fuse is a cartridge fuse: the ISO 8820-3 blade series has none (its 6 A is NEC 240.6(A)\'s)', () => {
    expect(fuseKindOf(6)).toMatch(/^Cartridge fuse/);
    expect(fuseKindOf(7.5)).toMatch(/^Blade fuse/);
    expect(fuseKindOf(40)).toMatch(/^Blade fuse/);
    expect(fuseKindOf(45)).toMatch(/^Bolt-down/);
    // A 5 A continuous load needs 6.25 A: the smallest standard rating is the blade 7.5 A.
    expect(size({ currentA: 5, continuous: true, lengthM: 1, maxDropPercent: 10 }).fuseA).toBe(7.5);
    // A 5.5 A load needs 5.5 A: NEC's 6 A cartridge, and it says so.
    const r = size({ currentA: 5.5, lengthM: 1, maxDropPercent: 10 });
    expect(r.fuseA).toBe(6);
    expect(r.fuseKind).toMatch(/Cartridge/);
  });
});

describe('NEC Table 8 at 75 °C against the ABYC relation', () => {
  it('sizes one step above K = 10.75 where the margin is thin (conservative)', () => {
    // REFERENCES.md, Voltage drop (worked): 10 A at 12 V over a 21 ft round trip (25 ft column) needs 16 AWG at
    // 10 % by ABYC's CM = 10.75 × 10 × 25 / 1.2 = 2240 cmil. By Table 8 at 75 °C 16 AWG drops 10 × 4.99 ×
    // 25 / 1000 = 1.25 V > 1.2 V, so the model takes 14 AWG (3.14 ohm/kft: 0.785 V).
    expect(saeSizeFor(abycCircularMils(10, 25, 1.2))).toBe('16');
    const r = size({ currentA: 10, lengthM: (25 * 0.3048) / 2, maxDropPercent: 10, insulationC: 105 });
    expect(r.awg).toBe('14');
    // At 3 % both give 10 AWG (7465 cmil; Table 8: 10 × 1.24 × 25 / 1000 = 0.31 V < 0.36 V).
    expect(saeSizeFor(abycCircularMils(10, 25, 0.36))).toBe('10');
    expect(size({ currentA: 10, lengthM: (25 * 0.3048) / 2, maxDropPercent: 3, insulationC: 105 }).awg).toBe('10');
  });
});
