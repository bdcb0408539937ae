// Measured readings against the model: state of charge from a resting voltage, the measured standby
// drain over a quiet parked period, and a voltage-drop test of a connection. Pure functions.
import type { z } from 'zod';

import type { chemistrySchema } from '../schemas/projection';

type Chemistry = z.infer<typeof chemistrySchema>;

/**
 * Flooded lead-acid, 12 V, resting open-circuit voltage by state of charge at about 27 °C
 * (Battery Council International table, also US Army TM 5-4210-230-14&P-1 Table 2; REFERENCES.md).
 */
export const BCI_RESTING_VOLTAGE: readonly [socPercent: number, volts: number][] = [
  [0, 11.89],
  [25, 12.06],
  [50, 12.24],
  [75, 12.45],
  [100, 12.65],
];

export const TEMPERATURE_NOTE =
  'The table is for a battery at about 27 °C (80 °F) that has rested two hours or more; a colder battery reads a little lower at the same charge, and AGM and gel batteries read a little higher when full (from memory).';
export const LIFEPO4_NOTE =
  "A LiFePO4 battery's resting voltage barely moves between 10 % and 90 % (REFERENCES.md, a cell maker's curve), so it cannot tell the state of charge: use the state of charge from a battery monitor, or log the current.";

export type SocEstimate = { socPercent: number | null; note: string };

/** State of charge from a rested voltage (a 24 V bank counts as two 12 V batteries in series). */
export function socFromRestingVoltage(chemistry: Chemistry, voltageV: number, systemVoltage = 12): SocEstimate {
  if (chemistry === 'lifepo4') return { socPercent: null, note: LIFEPO4_NOTE };
  const v = voltageV * (12 / systemVoltage);
  const table = BCI_RESTING_VOLTAGE;
  if (v >= table[table.length - 1][1]) {
    return { socPercent: 100, note: v > 12.9 ? `${voltageV} V is above a full battery at rest: surface charge from a recent charge, or it was not resting. ${TEMPERATURE_NOTE}` : TEMPERATURE_NOTE };
  }
  if (v <= table[0][1]) return { socPercent: 0, note: TEMPERATURE_NOTE };
  for (let i = 1; i < table.length; i++) {
    const [s1, v1] = table[i];
    const [s0, v0] = table[i - 1];
    if (v <= v1) return { socPercent: Math.round((s0 + ((v - v0) / (v1 - v0)) * (s1 - s0)) * 10) / 10, note: TEMPERATURE_NOTE };
  }
  return { socPercent: 100, note: TEMPERATURE_NOTE };
}

export type ReadingInput = { at: string; voltageV: number; currentA?: number | null; socPercent?: number | null; rested: boolean };
export type ReadingSoc = { at: string; socPercent: number | null; source: 'monitor' | 'voltage' | null };

export type ReadingsAnalysis = {
  readings: ReadingSoc[];
  /** Average drain over the quiet (rested) span, amps drawn from the battery; null where it cannot be told. */
  drainA: number | null;
  /** Length of that span in hours (0 when there is none). */
  hours: number;
  method: 'soc' | 'current' | null;
  span: { from: string; to: string } | null;
  reason: string | null;
  notes: string[];
};

const hoursBetween = (a: string, b: string) => (Date.parse(b) - Date.parse(a)) / 3_600_000;

/**
 * Each reading's state of charge (a monitor's figure first, else a rested voltage for lead-acid), and
 * the average drain over the longest run of rested readings: from the fall in state of charge across it
 * (capacity × fall / hours), or, when the charge cannot be told, the mean logged current.
 * Currents are positive when drawn from the battery.
 */
export function analyzeReadings(input: { chemistry: Chemistry; capacityAh: number; systemVoltage?: number; readings: ReadingInput[] }): ReadingsAnalysis {
  const sorted = [...input.readings].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const notes = new Set<string>();
  const readings: ReadingSoc[] = sorted.map((r) => {
    if (r.socPercent !== undefined && r.socPercent !== null) return { at: r.at, socPercent: r.socPercent, source: 'monitor' };
    if (!r.rested) return { at: r.at, socPercent: null, source: null };
    const est = socFromRestingVoltage(input.chemistry, r.voltageV, input.systemVoltage ?? 12);
    notes.add(est.note);
    return { at: r.at, socPercent: est.socPercent, source: est.socPercent === null ? null : 'voltage' };
  });

  // The longest run of consecutive rested readings.
  let best: [number, number] | null = null;
  for (let i = 0; i < sorted.length; ) {
    if (!sorted[i].rested) {
      i++;
      continue;
    }
    let j = i;
    while (j + 1 < sorted.length && sorted[j + 1].rested) j++;
    if (j > i && (!best || hoursBetween(sorted[i].at, sorted[j].at) > hoursBetween(sorted[best[0]].at, sorted[best[1]].at))) best = [i, j];
    i = j + 1;
  }
  const none = (reason: string): ReadingsAnalysis => ({ readings, drainA: null, hours: 0, method: null, span: null, reason, notes: [...notes] });
  if (!best) return none('No quiet period: mark at least two readings in a row as rested (no charging and nothing switched on for two hours or more).');
  const [a, b] = best;
  const hours = hoursBetween(sorted[a].at, sorted[b].at);
  if (hours < 1) return none('The quiet period is shorter than an hour; a longer one tells the drain better.');
  const span = { from: sorted[a].at, to: sorted[b].at };
  const s0 = readings[a].socPercent;
  const s1 = readings[b].socPercent;
  if (s0 !== null && s1 !== null) {
    const drainA = Math.round((((s0 - s1) / 100) * input.capacityAh / hours) * 1000) / 1000;
    return { readings, drainA, hours: Math.round(hours * 100) / 100, method: 'soc', span, reason: null, notes: [...notes] };
  }
  const currents = sorted.slice(a, b + 1).map((r) => r.currentA).filter((c): c is number => typeof c === 'number');
  if (currents.length) {
    const drainA = Math.round((currents.reduce((s, c) => s + c, 0) / currents.length) * 1000) / 1000;
    return { readings, drainA, hours: Math.round(hours * 100) / 100, method: 'current', span, reason: null, notes: [...notes] };
  }
  return {
    ...none(input.chemistry === 'lifepo4' ? LIFEPO4_NOTE : 'The state of charge at the start and end of the quiet period is not known, and no current was logged.'),
    hours: Math.round(hours * 100) / 100,
    span,
  };
}

export const STANDBY_CAUSES = [
  'a device left on: a light, a USB charger, a dash camera, a fridge running',
  'the inverter powered when it should be off',
  "the vehicle's own modules not going to sleep (alarm, radio, a door or boot light)",
  'a relay, DC-DC charger or battery monitor that draws while idle',
  'an ageing battery with a high self-discharge, or a failing cell',
];

/** Tolerance within which measured and modelled standby "match" (model choice). */
export const STANDBY_MATCH_PERCENT = 15;

export type StandbyComparison = { measuredA: number; modelA: number; matches: boolean; differencePercent: number | null; unexplainedA: number; message: string; causes: string[]; suggestedKeyOffDrawA: number };

/**
 * The measured drain against the model's standby for the same hours (inverter idle, key-off draw and
 * self-discharge, as amps). Suggests the key-off draw that would make them agree.
 */
export function compareStandby(measuredA: number, model: { inverterIdleA: number; keyOffA: number; selfDischargeA: number }): StandbyComparison {
  const modelA = model.inverterIdleA + model.keyOffA + model.selfDischargeA;
  const diff = measuredA - modelA;
  const pct = modelA > 0 ? Math.round((Math.abs(diff) / modelA) * 100) : null;
  const matches = pct !== null ? pct <= STANDBY_MATCH_PERCENT : Math.abs(diff) < 0.02;
  const suggestedKeyOffDrawA = Math.max(0, Math.round((measuredA - model.inverterIdleA - model.selfDischargeA) * 1000) / 1000);
  const r = (x: number) => Math.round(x * 1000) / 1000;
  const message = matches
    ? `Matches the model within ${pct ?? 0} %: ${r(measuredA)} A measured, ${r(modelA)} A modelled.`
    : diff > 0
      ? `${r(diff)} A unexplained: ${r(measuredA)} A measured against ${r(modelA)} A the model expects at standby.`
      : `The model expects ${r(-diff)} A more than measured (${r(modelA)} A against ${r(measuredA)} A): the key-off draw entered may be too high.`;
  return { measuredA: r(measuredA), modelA: r(modelA), matches, differencePercent: pct, unexplainedA: r(Math.max(0, diff)), message, causes: !matches && diff > 0 ? STANDBY_CAUSES : [], suggestedKeyOffDrawA };
}

/** A measured drop this much above the expected one flags the joint or ground (model choice). */
export const DROP_FLAG_FACTOR = 1.5;
export const DROP_FLAG_MARGIN_V = 0.05;

export type DropTest = { dropV: number; dropPercent: number; resistanceOhm: number; expectedDropV: number | null; flagged: boolean; message: string };

/**
 * Voltage-drop test (Ohm's law): with a known current flowing, the voltage at the battery and at the
 * device or ground point give the drop and the resistance between them. Compared with the cable run's
 * expected drop at that current, a much larger drop points at a poor ground point or joint.
 */
export function voltageDropTest(input: { batteryV: number; pointV: number; currentA: number; expectedOhm?: number | null }): DropTest {
  const dropV = Math.round((input.batteryV - input.pointV) * 1000) / 1000;
  const resistanceOhm = Math.round((dropV / input.currentA) * 10000) / 10000;
  const dropPercent = Math.round((dropV / input.batteryV) * 10000) / 100;
  const expectedDropV = input.expectedOhm === null || input.expectedOhm === undefined ? null : Math.round(input.expectedOhm * input.currentA * 1000) / 1000;
  const flagged = expectedDropV !== null && dropV > expectedDropV * DROP_FLAG_FACTOR + DROP_FLAG_MARGIN_V;
  const message =
    expectedDropV === null
      ? `${dropV} V lost (${dropPercent} %), ${resistanceOhm} Ω between the battery and that point.`
      : flagged
        ? `${dropV} V lost where the cable run should lose about ${expectedDropV} V: check the ground point and every joint on the way (clean, tight, crimped).`
        : `${dropV} V lost, about what the cable run should lose (${expectedDropV} V): the connections look sound.`;
  return { dropV, dropPercent, resistanceOhm, expectedDropV, flagged, message };
}
