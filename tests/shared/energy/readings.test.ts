import { describe, expect, it } from 'vitest';

import { analyzeReadings, compareStandby, socFromRestingVoltage, voltageDropTest } from '@/shared/energy/readings';
import { restingLog } from './fixtures';

describe('state of charge from a resting voltage (BCI table, REFERENCES.md)', () => {
  it('reads the table points and interpolates between them', () => {
    expect(socFromRestingVoltage('flooded', 12.65).socPercent).toBe(100);
    expect(socFromRestingVoltage('flooded', 12.45).socPercent).toBe(75);
    expect(socFromRestingVoltage('flooded', 12.24).socPercent).toBe(50);
    expect(socFromRestingVoltage('flooded', 11.89).socPercent).toBe(0);
    // Halfway from 12.24 V (50 %) to 12.45 V (75 %): 12.345 V = 62.5 %.
    expect(socFromRestingVoltage('agm', 12.345).socPercent).toBe(62.5);
    // A 24 V bank is two 12 V batteries in series: 24.9 V = 12.45 V each = 75 %.
    expect(socFromRestingVoltage('flooded', 24.9, 24).socPercent).toBe(75);
    expect(socFromRestingVoltage('flooded', 12.5).note).toMatch(/27 °C/);
  });

  it('says a LiFePO4 voltage cannot tell, and asks for a monitor or the current', () => {
    const r = socFromRestingVoltage('lifepo4', 13.2);
    expect(r.socPercent).toBeNull();
    expect(r.note).toMatch(/battery monitor/);
  });
});

describe('measured standby', () => {
  it('finds 0.5 A from 12.65 V to 12.45 V over 50 rested hours on 100 Ah, within 10 %', () => {
    const a = analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings: restingLog() });
    expect(a.method).toBe('soc');
    expect(a.hours).toBe(50);
    expect(Math.abs(a.drainA! - 0.5) / 0.5).toBeLessThan(0.1);
  });

  it('takes the logged current when the voltage cannot tell (LiFePO4)', () => {
    const readings = restingLog(10, 13.3, 13.28).map((r) => ({ ...r, currentA: 0.3 }));
    const a = analyzeReadings({ chemistry: 'lifepo4', capacityAh: 100, readings });
    expect(a).toMatchObject({ method: 'current', drainA: 0.3, hours: 10 });
  });

  it('says why when it cannot tell', () => {
    expect(analyzeReadings({ chemistry: 'lifepo4', capacityAh: 100, readings: restingLog(10) }).drainA).toBeNull();
    const unrested = restingLog(10).map((r) => ({ ...r, rested: false }));
    expect(analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings: unrested }).reason).toMatch(/rested/);
  });

  it('compares with the model: within 15 % matches; more is unexplained, with causes and the key-off draw that fits', () => {
    // Model standby: 0.45 A inverter idle (Wren's inverter), 0.02 A self-discharge, no key-off draw.
    const model = { inverterIdleA: 0.45, keyOffA: 0, selfDischargeA: 0.02 };
    expect(compareStandby(0.5, model)).toMatchObject({ matches: true, differencePercent: 6 });
    const c = compareStandby(0.8, model);
    expect(c.matches).toBe(false);
    expect(c.unexplainedA).toBe(0.33);
    expect(c.message).toMatch(/^0.33 A unexplained/);
    expect(c.causes.length).toBeGreaterThan(2);
    expect(c.suggestedKeyOffDrawA).toBe(0.33);
  });
});

describe('voltage-drop test (Ohm’s law: R = ΔV / I)', () => {
  it('12.6 V at the battery, 12.1 V at the fridge with 5 A flowing: 0.5 V, 0.1 Ω, 3.97 %', () => {
    const t = voltageDropTest({ batteryV: 12.6, pointV: 12.1, currentA: 5 });
    expect(t).toMatchObject({ dropV: 0.5, resistanceOhm: 0.1, dropPercent: 3.97, flagged: false });
  });

  it('flags a joint when the drop is far above the cable run’s expected drop', () => {
    // Expected: 0.02 Ω × 5 A = 0.1 V; measured 0.5 V > 1.5 × 0.1 + 0.05 V.
    expect(voltageDropTest({ batteryV: 12.6, pointV: 12.1, currentA: 5, expectedOhm: 0.02 }).flagged).toBe(true);
    expect(voltageDropTest({ batteryV: 12.6, pointV: 12.48, currentA: 5, expectedOhm: 0.02 }).flagged).toBe(false);
  });
});
