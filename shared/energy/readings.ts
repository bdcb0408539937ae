// Measured readings against the model: the drain counted from measured current first, a battery
// monitor's state of charge next, and only then a rough estimate from rested voltages; the measured
// drain against the model's over the same quiet hours; a voltage-drop test of a connection. Pure functions.
import type { z } from 'zod';

import type { chemistrySchema } from '../schemas/projection';
import { CHEMISTRY_DEFAULTS, temperatureFactor } from './defaults';

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

/** Rules of the readings analysis (model choices, documented in docs/readings.md). */
export const READING_RULES = {
  /** Current above this share of the rated capacity (C/1000, at least 0.05 A) is more than a trickle: the battery is not resting. */
  trickleShareOfCapacity: 0.001,
  trickleFloorA: 0.05,
  /** Two readings further apart than this are not joined: the current between them is not known. */
  maxGapHours: 12,
  /** A rested voltage tells the state of charge to about ±0.05 V (temperature, a short rest, the meter; from memory): about ±6 points on the BCI table's 0.2 V per 25 points. */
  voltageSocUncertaintyPoints: 6,
  /** Quiet hours needed before the measured drain is held against the model: one whole day, so every daily schedule is in it. */
  quietHoursNeeded: 24,
  /** Measured and modelled drains within this share "match". */
  matchPercent: 15,
} as const;

export const TEMPERATURE_NOTE =
  'The voltage table is for a battery at about 27 °C (80 °F) that has rested two hours or more with no charging and no more than a trickle flowing; a colder battery reads a little lower at the same charge.';
export const FLOODED_TABLE_NOTE =
  'No resting-voltage table for AGM or gel batteries is published in our references, so the flooded lead-acid table (BCI) is used: AGM and gel read higher when full (from memory, about 0.1 to 0.2 V), so a full one may show a little above 100 % or its fall may look smaller.';
export const LIFEPO4_NOTE =
  "A LiFePO4 battery's resting voltage barely moves between 10 % and 90 % (REFERENCES.md, a cell maker's curve), so it cannot tell the state of charge: use the state of charge from a battery monitor, or log the current.";

export type SocEstimate = { socPercent: number | null; note: string };

/** The current above which a battery is not resting (amps), for a bank of this rated capacity. */
export const trickleA = (capacityAh: number) => Math.max(READING_RULES.trickleFloorA, capacityAh * READING_RULES.trickleShareOfCapacity);

/** Usable amp-hours of a battery as the model counts them: rated × health × temperature factor (shared/energy/defaults.ts). */
export function usableCapacityAh(b: { chemistry: Chemistry; capacityAh: number; healthPercent?: number; temperatureC?: number; temperatureFactor?: number }) {
  return b.capacityAh * ((b.healthPercent ?? 100) / 100) * (b.temperatureFactor ?? temperatureFactor(CHEMISTRY_DEFAULTS[b.chemistry].temperatureCurve, b.temperatureC ?? 25));
}

/** Two significant figures: a drain worked from readings is not known to three decimals. */
export const twoFigures = (x: number) => (x === 0 ? 0 : Number(x.toPrecision(2)));

/** State of charge from a rested voltage (a 24 V bank counts as two 12 V batteries in series). */
export function socFromRestingVoltage(chemistry: Chemistry, voltageV: number, systemVoltage = 12): SocEstimate {
  if (chemistry === 'lifepo4') return { socPercent: null, note: LIFEPO4_NOTE };
  const note = chemistry === 'flooded' ? TEMPERATURE_NOTE : `${TEMPERATURE_NOTE} ${FLOODED_TABLE_NOTE}`;
  const v = voltageV * (12 / systemVoltage);
  const table = BCI_RESTING_VOLTAGE;
  if (v >= table[table.length - 1][1]) {
    return { socPercent: 100, note: v > 12.9 ? `${voltageV} V is above a full battery at rest: surface charge from a recent charge, or it was not resting. ${note}` : note };
  }
  if (v <= table[0][1]) return { socPercent: 0, note };
  for (let i = 1; i < table.length; i++) {
    const [s1, v1] = table[i];
    const [s0, v0] = table[i - 1];
    if (v <= v1) return { socPercent: Math.round((s0 + ((v - v0) / (v1 - v0)) * (s1 - s0)) * 10) / 10, note };
  }
  return { socPercent: 100, note };
}

export type ReadingInput = { at: string; voltageV: number; currentA?: number | null; socPercent?: number | null; rested: boolean; series?: string };
export type ReadingSoc = { at: string; socPercent: number | null; source: 'monitor' | 'voltage' | null };

/** One hour's share of the quiet record: hours with a measured current (not charging) and the amp-hours counted over them; likewise a monitor's falling state of charge. */
export type HourBucket = { hour: string; currentHours: number; currentAh: number; socHours: number; socFallPoints: number };
/** A run of consecutive rested readings (no charging, no more than a trickle): its first and last voltage. */
export type RestedRun = { from: string; to: string; fromV: number; toV: number };
/** What the analysis needs from a record of readings; the server works it out in SQL, `summarizeReadings` from a list. */
export type ReadingsSummary = { hourly: HourBucket[]; restedRuns: RestedRun[]; flaggedRested: number };

const H = 3_600_000;

/**
 * The summary of a list of readings, by the rules the server's SQL follows (server/repositories/readings.ts):
 * within each series (one log, or the typed readings), each pair of consecutive readings up to 12 h apart is
 * a segment, counted in the hour it starts. Its current is the mean of the currents measured at its ends
 * (one end is enough); a segment with either end charging (below minus a trickle) is not quiet.
 */
export function summarizeReadings(readings: ReadingInput[], capacityAh: number): ReadingsSummary {
  const trickle = trickleA(capacityAh);
  const bySeries = new Map<string, ReadingInput[]>();
  for (const r of readings) bySeries.set(r.series ?? '', [...(bySeries.get(r.series ?? '') ?? []), r]);
  const buckets = new Map<number, HourBucket>();
  const restedRuns: RestedRun[] = [];
  let flaggedRested = 0;
  const bucket = (ms: number) => {
    const key = Math.floor(ms / H) * H;
    let b = buckets.get(key);
    if (!b) buckets.set(key, (b = { hour: new Date(key).toISOString(), currentHours: 0, currentAh: 0, socHours: 0, socFallPoints: 0 }));
    return b;
  };
  for (const list of bySeries.values()) {
    list.sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
    const isRested = (r: ReadingInput) => r.rested && (r.currentA == null || Math.abs(r.currentA) <= trickle);
    let run: ReadingInput[] = [];
    const closeRun = () => {
      if (run.length >= 2) restedRuns.push({ from: run[0].at, to: run[run.length - 1].at, fromV: run[0].voltageV, toV: run[run.length - 1].voltageV });
      run = [];
    };
    list.forEach((r, i) => {
      if (r.rested && !isRested(r)) flaggedRested++;
      if (isRested(r)) run.push(r);
      else closeRun();
      const next = list[i + 1];
      if (!next) return;
      const t0 = Date.parse(r.at);
      const dt = (Date.parse(next.at) - t0) / H;
      if (dt <= 0 || dt > READING_RULES.maxGapHours) return;
      const known = [r.currentA, next.currentA].filter((c): c is number => c !== null && c !== undefined);
      if (known.length && known.every((c) => c >= -trickle)) {
        const b = bucket(t0);
        b.currentHours += dt;
        b.currentAh += (known.reduce((s, c) => s + c, 0) / known.length) * dt;
      }
      if (r.socPercent != null && next.socPercent != null && next.socPercent <= r.socPercent) {
        const b = bucket(t0);
        b.socHours += dt;
        b.socFallPoints += r.socPercent - next.socPercent;
      }
    });
    closeRun();
  }
  return { hourly: [...buckets.values()].sort((a, b) => a.hour.localeCompare(b.hour)), restedRuns, flaggedRested };
}

export type DrainSpan = { from: string; hours: number };
export type ReadingsAnalysis = {
  /** Average drain over the quiet hours, amps drawn from the battery (two significant figures); null where it cannot be told. */
  drainA: number | null;
  /** The rough estimate's range (voltage table only); null for a measured drain. */
  rangeA: [number, number] | null;
  method: 'current' | 'monitor' | 'voltage' | null;
  /** Quiet hours the drain is worked over (0 when none). */
  hours: number;
  /** Where in time those hours lie, for holding them against the model. */
  spans: DrainSpan[];
  usableAh: number;
  /** Readings marked rested that carried more than a trickle: counted as not rested. */
  flaggedRested: number;
  label: string;
  reason: string | null;
  notes: string[];
};

/**
 * The drain over the quiet hours of a record: counted from measured current where there is any (amp-hours
 * over time), else from a battery monitor's falling state of charge, else (lead-acid only) a rough estimate
 * from the rested voltages with its uncertainty. State-of-charge drains are worked on the usable capacity.
 */
export function analyzeSummary(input: { chemistry: Chemistry; usableAh: number; systemVoltage?: number; capacityAh: number }, s: ReadingsSummary): ReadingsAnalysis {
  const notes: string[] = [];
  const trickle = trickleA(input.capacityAh);
  if (s.flaggedRested) {
    notes.push(`${s.flaggedRested} reading${s.flaggedRested === 1 ? ' was' : 's were'} marked rested with more than a trickle flowing (over ${twoFigures(trickle)} A): a battery with current flowing is not resting, so ${s.flaggedRested === 1 ? 'it counts' : 'they count'} as not rested.`);
  }
  const base = { usableAh: Math.round(input.usableAh * 10) / 10, flaggedRested: s.flaggedRested, notes };
  const round2 = (x: number) => Math.round(x * 100) / 100;
  const currentHours = s.hourly.reduce((t, b) => t + b.currentHours, 0);
  if (currentHours > 0) {
    const ah = s.hourly.reduce((t, b) => t + b.currentAh, 0);
    const drainA = twoFigures(ah / currentHours);
    return { ...base, drainA, rangeA: null, method: 'current', hours: round2(currentHours), spans: s.hourly.filter((b) => b.currentHours > 0).map((b) => ({ from: b.hour, hours: b.currentHours })), label: `${drainA} A average drain, counted from the measured current over ${round2(currentHours)} quiet hours.`, reason: null };
  }
  const socHours = s.hourly.reduce((t, b) => t + b.socHours, 0);
  if (socHours >= 1) {
    const points = s.hourly.reduce((t, b) => t + b.socFallPoints, 0);
    const drainA = twoFigures(((points / 100) * input.usableAh) / socHours);
    return { ...base, drainA, rangeA: null, method: 'monitor', hours: round2(socHours), spans: s.hourly.filter((b) => b.socHours > 0).map((b) => ({ from: b.hour, hours: b.socHours })), label: `${drainA} A average drain, from the monitor's state of charge over ${round2(socHours)} hours (on ${base.usableAh} Ah usable).`, reason: null };
  }
  const none = (reason: string): ReadingsAnalysis => ({ ...base, drainA: null, rangeA: null, method: null, hours: 0, spans: [], label: '', reason });
  if (input.chemistry === 'lifepo4') return none(LIFEPO4_NOTE);
  const runs = s.restedRuns.filter((r) => Date.parse(r.to) - Date.parse(r.from) >= H);
  if (!runs.length) {
    return none(
      s.restedRuns.length
        ? 'The quiet periods are shorter than an hour; a longer one tells the drain better.'
        : 'No current was measured and no quiet period is known: type the current you measure, upload a log with a current column, or mark at least two readings in a row as rested (no charging and nothing switched on for two hours or more).',
    );
  }
  notes.push(input.chemistry === 'flooded' ? TEMPERATURE_NOTE : `${TEMPERATURE_NOTE} ${FLOODED_TABLE_NOTE}`);
  const sv = input.systemVoltage ?? 12;
  let points = 0;
  let hours = 0;
  for (const r of runs) {
    points += socFromRestingVoltage(input.chemistry, r.fromV, sv).socPercent! - socFromRestingVoltage(input.chemistry, r.toV, sv).socPercent!;
    hours += (Date.parse(r.to) - Date.parse(r.from)) / H;
  }
  // Each run's fall carries the uncertainty of its two ends (root-sum-square over the runs).
  const u = READING_RULES.voltageSocUncertaintyPoints * Math.sqrt(2 * runs.length);
  const perPointA = input.usableAh / 100 / hours;
  const drainA = twoFigures(points * perPointA);
  const rangeA: [number, number] = [twoFigures(Math.max(0, (points - u) * perPointA)), twoFigures((points + u) * perPointA)];
  return {
    ...base,
    drainA,
    rangeA,
    method: 'voltage',
    hours: round2(hours),
    spans: runs.map((r) => ({ from: r.from, hours: (Date.parse(r.to) - Date.parse(r.from)) / H })),
    label: `Rough estimate: about ${drainA} A (somewhere from ${rangeA[0]} to ${rangeA[1]} A), from the fall in rested voltage over ${round2(hours)} hours. Measure the current for a real figure.`,
    reason: null,
  };
}

/** The whole analysis of a list of readings (POST /api/readings/analyze): each reading's state of charge, and the drain. */
export function analyzeReadings(input: { chemistry: Chemistry; capacityAh: number; healthPercent?: number; temperatureC?: number; systemVoltage?: number; readings: ReadingInput[] }): ReadingsAnalysis & { readings: ReadingSoc[] } {
  const trickle = trickleA(input.capacityAh);
  const sorted = [...input.readings].sort((a, b) => Date.parse(a.at) - Date.parse(b.at));
  const readings: ReadingSoc[] = sorted.map((r) => {
    if (r.socPercent !== undefined && r.socPercent !== null) return { at: r.at, socPercent: r.socPercent, source: 'monitor' };
    if (!r.rested || (r.currentA != null && Math.abs(r.currentA) > trickle)) return { at: r.at, socPercent: null, source: null };
    const est = socFromRestingVoltage(input.chemistry, r.voltageV, input.systemVoltage ?? 12);
    return { at: r.at, socPercent: est.socPercent, source: est.socPercent === null ? null : 'voltage' };
  });
  const analysis = analyzeSummary({ ...input, usableAh: usableCapacityAh(input) }, summarizeReadings(sorted, input.capacityAh));
  return { ...analysis, readings };
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
