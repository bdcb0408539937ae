import { describe, expect, it } from 'vitest';

import { analyzeReadings, socFromRestingVoltage, summarizeReadings, twoFigures, voltageDropTest } from '@/shared/energy/readings';
import { compareWithModel } from '@/shared/energy/readings-compare';
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

const at = (h: number) => new Date(Date.parse('2026-11-20T08:00:00Z') + h * 3_600_000).toISOString();

describe('the drain, measured current first', () => {
  it('takes the 0.8 A typed in over 2 hours, not 5.9 A from the fall 12.71 V to 12.55 V (issue 22)', () => {
    // The voltage alone: 12.71 V is above full (BCI: 12.65 V = 100 %), 12.55 V = 87.5 %: 12.5 Ah in 2 h would be 6.2 A.
    const readings = [
      { at: at(0), voltageV: 12.71, rested: true },
      { at: at(2), voltageV: 12.55, currentA: 0.8, rested: false },
    ];
    const a = analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings });
    expect(a).toMatchObject({ method: 'current', drainA: 0.8, hours: 2, rangeA: null });
    expect(a.label).toMatch(/counted from the measured current/);
  });

  it('counts amp-hours over time between logged currents (trapezoids): 1.0, 0.6, 0.6 A at 0, 1 and 3 h is 2.0 Ah in 3 h', () => {
    // (1.0 + 0.6) / 2 × 1 h + (0.6 + 0.6) / 2 × 2 h = 0.8 + 1.2 = 2.0 Ah; 2.0 / 3 = 0.667 A, shown to two figures.
    const readings = [1.0, 0.6, null, 0.6].map((c, i) => ({ at: at([0, 1, 2, 3][i]), voltageV: 12.5, currentA: c, rested: false }));
    readings.splice(2, 1);
    expect(analyzeReadings({ chemistry: 'agm', capacityAh: 100, readings })).toMatchObject({ method: 'current', drainA: 0.67, hours: 3 });
  });

  it('leaves charging hours out of the quiet hours, and does not join readings more than 12 h apart', () => {
    const readings = [
      { at: at(0), voltageV: 12.5, currentA: 0.5, rested: false },
      { at: at(1), voltageV: 12.5, currentA: 0.5, rested: false },
      { at: at(2), voltageV: 13.8, currentA: -15, rested: false },
      { at: at(3), voltageV: 12.7, currentA: 0.5, rested: false },
      { at: at(20), voltageV: 12.6, currentA: 0.5, rested: false },
    ];
    expect(analyzeReadings({ chemistry: 'agm', capacityAh: 100, readings })).toMatchObject({ method: 'current', drainA: 0.5, hours: 1 });
  });

  it('takes current logged as negative discharge once the mapping turns it round (stored positive when drawn)', () => {
    const s = summarizeReadings([0, 1, 2].map((h) => ({ at: at(h), voltageV: 12.5, currentA: 0.45, rested: false })), 100);
    expect(s.hourly.map((b) => b.currentAh)).toEqual([0.45, 0.45]);
  });

  it("takes a monitor's falling state of charge where no current was logged: 90 % to 85 % of 100 Ah in 10 h is 0.5 A", () => {
    // 5 points × 100 Ah usable / 10 h = 0.5 A; the rise while charging (hour 10 to 11) is left out.
    const readings = [...Array.from({ length: 11 }, (_, h) => ({ at: at(h), voltageV: 12.6, socPercent: 90 - h / 2, rested: false })), { at: at(11), voltageV: 13.9, socPercent: 95, rested: false }];
    expect(analyzeReadings({ chemistry: 'lifepo4', capacityAh: 100, readings })).toMatchObject({ method: 'monitor', drainA: 0.5, hours: 10 });
  });

  it('flags a reading marked rested with more than a trickle flowing (C/1000: 0.1 A on 100 Ah) and counts it as not rested', () => {
    const readings = [
      { at: at(0), voltageV: 12.65, rested: true },
      { at: at(5), voltageV: 12.6, currentA: 0.8, rested: true },
      { at: at(10), voltageV: 12.45, rested: true },
    ];
    const a = analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings });
    expect(a.flaggedRested).toBe(1);
    expect(a.notes[0]).toMatch(/marked rested with more than a trickle flowing \(over 0.1 A\)/);
    expect(a.readings[1].socPercent).toBeNull();
  });
});

describe('the rough estimate from rested voltages (BCI table, REFERENCES.md)', () => {
  it('finds about 0.5 A from 12.65 V to 12.45 V over 50 rested hours on 100 Ah, with its range', () => {
    // 100 % to 75 % (BCI) = 25 Ah in 50 h = 0.5 A. Each end ±6 points (±0.05 V, from memory):
    // ±6 × √2 = ±8.5 points, so 16.5 to 33.5 Ah: 0.33 to 0.67 A.
    const a = analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings: restingLog() });
    expect(a).toMatchObject({ method: 'voltage', drainA: 0.5, hours: 50, rangeA: [0.33, 0.67] });
    expect(a.label).toMatch(/^Rough estimate/);
  });

  it('works the fall on the usable capacity: 80 % health at 0 °C (75 %, US Army TM 10-6140-200-14) makes 60 Ah, so 0.3 A', () => {
    const a = analyzeReadings({ chemistry: 'flooded', capacityAh: 100, healthPercent: 80, temperatureC: 0, readings: restingLog() });
    expect(a.usableAh).toBe(60);
    expect(a.drainA).toBe(0.3);
  });

  it('says the flooded table is used for AGM and gel, and that LiFePO4 voltage cannot tell', () => {
    expect(analyzeReadings({ chemistry: 'agm', capacityAh: 100, readings: restingLog() }).notes.join(' ')).toMatch(/flooded lead-acid table \(BCI\) is used/);
    const lfp = analyzeReadings({ chemistry: 'lifepo4', capacityAh: 100, readings: restingLog(10) });
    expect(lfp.drainA).toBeNull();
    expect(lfp.reason).toMatch(/battery monitor/);
  });

  it('says why when nothing tells the drain', () => {
    const unrested = restingLog(10).map((r) => ({ ...r, rested: false }));
    expect(analyzeReadings({ chemistry: 'flooded', capacityAh: 100, readings: unrested }).reason).toMatch(/measure|rested/);
  });

  it('shows drains to two significant figures', () => {
    expect([twoFigures(5.913), twoFigures(0.04567), twoFigures(12.5)]).toEqual([5.9, 0.046, 13]);
  });
});

describe('measured against the model, over the same quiet hours', () => {
  const measured = (hours: number, amps: number) => analyzeReadings({ chemistry: 'agm', capacityAh: 100, readings: Array.from({ length: hours + 1 }, (_, h) => ({ at: at(h), voltageV: 12.5, currentA: amps, rested: false })) });

  it('says how many more quiet hours are needed before it compares (24 needed, model choice)', () => {
    const c = compareWithModel(measured(10, 0.5), () => 0.47, 0);
    expect(c).toMatchObject({ enough: false, quietHours: 10, neededHours: 24, matches: null });
    expect(c!.message).toMatch(/Not enough quiet hours yet.*10 of 24; 14 more needed/);
  });

  it('matches within 15 % over a day: 0.5 A measured, 0.47 A modelled (inverter idle 0.45 A + self-discharge)', () => {
    const c = compareWithModel(measured(30, 0.5), () => 0.47, 0);
    expect(c).toMatchObject({ enough: true, quietHours: 30, matches: true, differencePercent: 6, suggestedKeyOffDrawA: null });
  });

  it('names the gap and the key-off draw that would close it when the measured drain is higher', () => {
    // 0.8 A measured against 0.47 A: 0.33 A more; with 0.03 A key-off draw entered, 0.36 A would fit.
    const c = compareWithModel(measured(30, 0.8), () => 0.47, 0.03);
    expect(c).toMatchObject({ matches: false, suggestedKeyOffDrawA: 0.36 });
    expect(c!.message).toMatch(/^0.33 A more than the model/);
    expect(c!.causes.length).toBeGreaterThan(2);
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
