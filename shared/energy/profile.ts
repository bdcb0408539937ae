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

/** The week's demand: per hour, DC and AC currents parked and driving, and how much of the hour an AC load runs. */
export type DemandProfile = {
  loads: LoadProfile[];
  dcParked: number[];
  dcDriving: number[];
  acParked: number[];
  acDriving: number[];
  acActiveParked: number[];
  acActiveDriving: number[];
  /** AC draw with the inverter's floor: while a load runs the inverter draws at least its idle current. */
  acFloorParked: number[];
  acFloorDriving: number[];
  acWattsParked: number[];
  acWattsDriving: number[];
};

// The ten per-hour aggregates, in this order, in the table of spread loads' levels per day.
const DC_P = 0;
const DC_D = 1;
const AC_P = 2;
const AC_D = 3;
const ACTIVE_P = 4;
const ACTIVE_D = 5;
const FLOOR_P = 6;
const FLOOR_D = 7;
const WATTS_P = 8;
const WATTS_D = 9;

export function buildDemandProfile(loads: Load[], systemVoltage: number, inverterEfficiency: number, inverterIdleA = 0): DemandProfile {
  const profile: DemandProfile = {
    loads: [],
    dcParked: zeros(HOURS_PER_WEEK),
    dcDriving: zeros(HOURS_PER_WEEK),
    acParked: zeros(HOURS_PER_WEEK),
    acDriving: zeros(HOURS_PER_WEEK),
    acActiveParked: zeros(HOURS_PER_WEEK),
    acActiveDriving: zeros(HOURS_PER_WEEK),
    acFloorParked: zeros(HOURS_PER_WEEK),
    acFloorDriving: zeros(HOURS_PER_WEEK),
    acWattsParked: zeros(HOURS_PER_WEEK),
    acWattsDriving: zeros(HOURS_PER_WEEK),
  };
  const { dcParked, dcDriving, acParked, acDriving, acActiveParked, acActiveDriving, acFloorParked, acFloorDriving, acWattsParked, acWattsDriving } = profile;
  // Spread loads add the same to every hour of a day: gathered per day, added to the hours at the end.
  const levels = zeros(10 * 7);
  let anySpread = false;
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
    // Each AC load pays at least the idle current over its own running time (overlaps are counted
    // twice, on the safe side), so adding a load can never lower the inverter's draw.
    const floorA = amps > inverterIdleA ? amps : inverterIdleA;
    if (startHour < 0) {
      anySpread = true;
      const x = hoursPerDay / 24;
      const a = amps * x;
      for (let day = 0; day < 7; day++) {
        if ((days & (1 << day)) === 0) continue;
        if (!ac) {
          if (onParked) levels[DC_P * 7 + day] += a;
          if (onDriving) levels[DC_D * 7 + day] += a;
          continue;
        }
        if (onParked) {
          levels[AC_P * 7 + day] += a;
          levels[FLOOR_P * 7 + day] += floorA * x;
          if (x > levels[ACTIVE_P * 7 + day]) levels[ACTIVE_P * 7 + day] = x;
          levels[WATTS_P * 7 + day] += watts;
        }
        if (onDriving) {
          levels[AC_D * 7 + day] += a;
          levels[FLOOR_D * 7 + day] += floorA * x;
          if (x > levels[ACTIVE_D * 7 + day]) levels[ACTIVE_D * 7 + day] = x;
          levels[WATTS_D * 7 + day] += watts;
        }
      }
      continue;
    }
    for (let day = 0; day < 7; day++) {
      if ((days & (1 << day)) === 0) continue;
      let t = day * 24 + startHour;
      let left = hoursPerDay;
      while (left > 1e-12) {
        const x = left < 1 ? left : 1;
        const h = t % HOURS_PER_WEEK;
        left -= x;
        t++;
        const a = amps * x;
        if (!ac) {
          if (onParked) dcParked[h] += a;
          if (onDriving) dcDriving[h] += a;
          continue;
        }
        const floor = floorA * x;
        if (onParked) {
          acParked[h] += a;
          acFloorParked[h] += floor;
          if (x > acActiveParked[h]) acActiveParked[h] = x;
          acWattsParked[h] += watts;
        }
        if (onDriving) {
          acDriving[h] += a;
          acFloorDriving[h] += floor;
          if (x > acActiveDriving[h]) acActiveDriving[h] = x;
          acWattsDriving[h] += watts;
        }
      }
    }
  }
  if (anySpread) {
    const byIndex = [dcParked, dcDriving, acParked, acDriving, acActiveParked, acActiveDriving, acFloorParked, acFloorDriving, acWattsParked, acWattsDriving];
    for (let k = 0; k < 10; k++) {
      const out = byIndex[k];
      const isMax = k === ACTIVE_P || k === ACTIVE_D;
      for (let day = 0; day < 7; day++) {
        const level = levels[k * 7 + day];
        if (level === 0) continue;
        for (let h = day * 24, end = h + 24; h < end; h++) {
          if (!isMax) out[h] += level;
          else if (level > out[h]) out[h] = level;
        }
      }
    }
  }
  return profile;
}

/** Fraction of each hour of the week spent driving: each day's minutes from the start hour on. */
export function drivingFractions(minutesPerDay: readonly number[], startHour: number): number[] {
  const out = zeros(HOURS_PER_WEEK);
  minutesPerDay.forEach((minutes, day) => {
    let t = day * 24 + startHour;
    let left = minutes / 60;
    while (left > 1e-12) {
      const part = Math.min(1, left);
      out[t % HOURS_PER_WEEK] = Math.min(1, out[t % HOURS_PER_WEEK] + part);
      left -= part;
      t++;
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
