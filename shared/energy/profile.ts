import type { Load } from '../schemas/projection';

export const HOURS_PER_WEEK = 168;

// Zero-filled arrays of doubles, copied from a template: a copy is about ten times cheaper than a new
// Float64Array of this size (typed arrays over 64 bytes live outside V8's heap), and starting as doubles
// spares the loops a change of element kind on their first fractional write.
const templates = new Map<number, number[]>();

/** n zeros, as a plain array that already holds doubles. */
export function zeros(n: number): number[] {
  let t = templates.get(n);
  if (!t) {
    t = [];
    for (let i = 0; i < n; i++) t.push(0.5);
    t.fill(0);
    if (templates.size < 64) templates.set(n, t);
  }
  return t.slice();
}

/** Battery-side current of one load while it runs, before duty cycle: W / V, or W / (V × efficiency) on AC. */
export function loadRunningCurrentA(load: Load, systemVoltage: number, inverterEfficiency: number): number {
  const perUnit =
    load.amps !== undefined
      ? load.amps
      : load.supply === 'ac'
        ? (load.watts ?? 0) / (systemVoltage * inverterEfficiency)
        : (load.watts ?? 0) / systemVoltage;
  return perUnit * load.quantity;
}

/**
 * One load over the week. Its schedule: on each of its weekdays (bits, Monday = 1) either a window of
 * hoursPerDay from startHour (a window may run past midnight; each hour of it counts in full, the last
 * one by its fraction), or, with startHour -1, its hours spread evenly over the day (each hour counts
 * hoursPerDay / 24). A window is at most 24 hours and starts on a whole hour, so no hour is counted twice.
 * A "driving" load runs whenever the vehicle is driven: every day, spread, 24 hours, driving only.
 */
export type LoadProfile = {
  load: Load;
  ac: boolean;
  runningA: number;
  /** Amps at the battery while on, duty cycle included. */
  amps: number;
  days: number;
  startHour: number;
  hoursPerDay: number;
  onParked: boolean;
  onDriving: boolean;
  /** On in some hour while parked. */
  runsParked: boolean;
};

/**
 * Where each figure of an hour sits in DemandProfile.byHour: hour h's figures start at h × HOUR_STRIDE,
 * the parked ones first (PARKED), then the driving ones (DRIVING); within each: DC current, AC current,
 * the fraction of the hour an AC load is scheduled (the manual switch powers the inverter then), and the
 * watts of the AC loads on together. One array with an hour's figures side by side: the run reads them together.
 */
export const PARKED = 0;
export const DRIVING = 4;
export const DC_A = 0;
export const AC_A = 1;
export const AC_ACTIVE = 2;
export const AC_WATTS = 3;
export const HOUR_STRIDE = 8;

/** The week's demand: the loads, and per hour their DC and AC figures parked and driving (see HOUR_STRIDE). */
export type DemandProfile = {
  loads: LoadProfile[];
  byHour: number[];
  /** Peukert's extra current per hour by battery (see peukertExtras), kept for the Fixes' re-runs. */
  extras: Map<string, number[]>;
};

/** Calls fn(hour of the week, share of that hour) for every hour a load runs (see LoadProfile). */
export function eachHourOf(lp: LoadProfile, fn: (hour: number, x: number) => void) {
  for (let day = 0; day < 7; day++) {
    if ((lp.days & (1 << day)) === 0) continue;
    if (lp.startHour < 0) {
      const x = lp.hoursPerDay / 24;
      if (x > 0) for (let h = day * 24, end = h + 24; h < end; h++) fn(h, x);
      continue;
    }
    let t = day * 24 + lp.startHour;
    let left = lp.hoursPerDay;
    while (left > 1e-12) {
      const x = left < 1 ? left : 1;
      fn(t % HOURS_PER_WEEK, x);
      left -= x;
      t++;
    }
  }
}

/** Peukert's factor for a draw at its running current: (I / I_rated)^(k−1) above the rated current, else 1. */
export function peukertFactor(runningA: number, ratedA: number, k: number): number {
  return runningA > ratedA ? Math.pow(runningA / ratedA, k - 1) : 1;
}

/**
 * Peukert's extra current per hour of the week, for a battery of rated current ratedA and exponent k:
 * each load costs amps × (factor − 1) more over its own running time, the factor taken at its running
 * current (before duty cycle), so a short heavy load costs the same spread or in a window. Per hour:
 * parked DC, parked AC, driving DC, driving AC (index hour × 4 + (driving ? 2 : 0) + (ac ? 1 : 0)).
 */
export function peukertExtras(demand: DemandProfile, ratedA: number, k: number): number[] | null {
  const key = `${ratedA}|${k}`;
  const cached = demand.extras.get(key);
  if (cached) return cached.length ? cached : null;
  const out = zeros(HOURS_PER_WEEK * 4);
  let any = false;
  for (const lp of demand.loads) {
    const factor = peukertFactor(lp.runningA, ratedA, k);
    if (factor <= 1 || lp.amps <= 0) continue;
    any = true;
    const extra = lp.amps * (factor - 1);
    const col = lp.ac ? 1 : 0;
    eachHourOf(lp, (h, x) => {
      if (lp.onParked) out[h * 4 + col] += extra * x;
      if (lp.onDriving) out[h * 4 + 2 + col] += extra * x;
    });
  }
  if (demand.extras.size > 64) demand.extras.clear();
  demand.extras.set(key, any ? out : []);
  return any ? out : null;
}

export function buildDemandProfile(loads: Load[], systemVoltage: number, inverterEfficiency: number): DemandProfile {
  const byHour = zeros(HOURS_PER_WEEK * HOUR_STRIDE);
  const profile: DemandProfile = { loads: [], byHour, extras: new Map() };
  // Spread loads add the same to every hour of a day: gathered per day (same layout), added at the end.
  const levels = zeros(7 * HOUR_STRIDE);
  let anySpread = false;
  // Adds one load's share x of an hour to slot i (an hour's or a day's) of the table.
  const add = (table: number[], i: number, ac: boolean, a: number, x: number, watts: number) => {
    if (!ac) {
      table[i + DC_A] += a;
      return;
    }
    table[i + AC_A] += a;
    if (x > table[i + AC_ACTIVE]) table[i + AC_ACTIVE] = x;
    table[i + AC_WATTS] += watts;
  };
  for (const load of loads) {
    const ac = load.supply === 'ac';
    const runningA = loadRunningCurrentA(load, systemVoltage, inverterEfficiency);
    const amps = runningA * (load.dutyPercent / 100);
    const drivingOnly = load.when === 'driving';
    const onParked = !drivingOnly;
    const onDriving = load.when !== 'parked';
    let days = 0x7f;
    if (load.weekdays && !drivingOnly) {
      days = 0;
      for (const d of load.weekdays) days |= 1 << d;
    }
    const startHour = drivingOnly || load.startHour === undefined ? -1 : load.startHour;
    const hoursPerDay = drivingOnly ? 24 : load.hoursPerDay;
    // On at all: a spread load whose share of each hour is above 0, a window longer than rounding.
    const on = startHour < 0 ? hoursPerDay / 24 > 0 : hoursPerDay > 1e-12;
    profile.loads.push({ load, ac, runningA, amps, days, startHour, hoursPerDay, onParked, onDriving, runsParked: onParked && on });
    if (!on) continue;
    const watts = load.watts !== undefined ? load.watts * load.quantity : runningA * systemVoltage * inverterEfficiency;
    if (startHour < 0) {
      anySpread = true;
      const x = hoursPerDay / 24;
      for (let day = 0; day < 7; day++) {
        if ((days & (1 << day)) === 0) continue;
        if (onParked) add(levels, day * HOUR_STRIDE + PARKED, ac, amps * x, x, watts);
        if (onDriving) add(levels, day * HOUR_STRIDE + DRIVING, ac, amps * x, x, watts);
      }
      continue;
    }
    for (let day = 0; day < 7; day++) {
      if ((days & (1 << day)) === 0) continue;
      let t = day * 24 + startHour;
      let left = hoursPerDay;
      while (left > 1e-12) {
        const x = left < 1 ? left : 1;
        const i = (t % HOURS_PER_WEEK) * HOUR_STRIDE;
        left -= x;
        t++;
        if (onParked) add(byHour, i + PARKED, ac, amps * x, x, watts);
        if (onDriving) add(byHour, i + DRIVING, ac, amps * x, x, watts);
      }
    }
  }
  if (anySpread) {
    for (let day = 0; day < 7; day++) {
      for (let k = 0; k < HOUR_STRIDE; k++) {
        const level = levels[day * HOUR_STRIDE + k];
        if (level === 0) continue;
        const isMax = k === PARKED + AC_ACTIVE || k === DRIVING + AC_ACTIVE;
        for (let h = day * 24, end = h + 24; h < end; h++) {
          const i = h * HOUR_STRIDE + k;
          if (!isMax) byHour[i] += level;
          else if (level > byHour[i]) byHour[i] = level;
        }
      }
    }
  }
  return profile;
}

/**
 * Fraction of each hour of the week spent driving: each day's minutes from the start hour on. With
 * skipMinutes, the first minutes of each day's drive are left out (a relay joins only after them).
 */
export function drivingFractions(minutesPerDay: readonly number[], startHour: number, skipMinutes = 0): number[] {
  const out = zeros(HOURS_PER_WEEK);
  minutesPerDay.forEach((minutes, day) => {
    if (minutes <= skipMinutes) return;
    // [from, to) in hours of the week, walked hour by hour.
    let from = day * 24 + startHour + skipMinutes / 60;
    const to = day * 24 + startHour + minutes / 60;
    while (to - from > 1e-12) {
      const hour = Math.floor(from + 1e-12);
      const part = Math.min(hour + 1, to) - from;
      const i = hour % HOURS_PER_WEEK;
      out[i] = Math.min(1, out[i] + part);
      from += part;
    }
  });
  return out;
}

/** Solar current per hour of day: the day's amp-hours (W × peak sun hours × derate / V) over a half sine of daylight. */
export function solarCurrents(
  watts: number,
  peakSunHours: number,
  derate: number,
  systemVoltage: number,
  daylightStart: number,
  daylightEnd: number,
): number[] {
  const out = zeros(24);
  const dailyAh = (watts * peakSunHours * derate) / systemVoltage;
  if (dailyAh <= 0) return out;
  const span = daylightEnd - daylightStart;
  let sum = 0;
  for (let h = daylightStart; h < daylightEnd; h++) {
    out[h] = Math.sin((Math.PI * (h + 0.5 - daylightStart)) / span);
    sum += out[h];
  }
  for (let h = 0; h < 24; h++) out[h] = (out[h] / sum) * dailyAh;
  return out;
}
