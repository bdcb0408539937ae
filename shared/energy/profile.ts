import type { Load } from '../schemas/projection';

export const HOURS_PER_WEEK = 168;
const ALL_DAYS = [0, 1, 2, 3, 4, 5, 6];

/** A plain array of numbers (small typed arrays cost more to allocate than they save here). */
export function zeros(n: number, value = 0): number[] {
  const out = new Array<number>(n);
  for (let i = 0; i < n; i++) out[i] = value;
  return out;
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
 * The fraction of each hour of the week (Monday 00:00 first) in which a load is scheduled: its window of
 * hoursPerDay from startHour on each of its weekdays (a window may run past midnight), or, without a
 * start hour, its hours spread evenly over the day.
 */
export function scheduleFractions(load: Load): number[] {
  const out = zeros(HOURS_PER_WEEK);
  const days = load.weekdays ? [...new Set(load.weekdays)] : ALL_DAYS;
  const hours = load.hoursPerDay;
  for (const day of days) {
    if (load.startHour === undefined) {
      for (let h = 0; h < 24; h++) out[day * 24 + h] += hours / 24;
      continue;
    }
    let t = day * 24 + load.startHour;
    let left = hours;
    while (left > 1e-12) {
      const part = Math.min(1, left);
      out[t % HOURS_PER_WEEK] += part;
      left -= part;
      t++;
    }
  }
  for (let h = 0; h < HOURS_PER_WEEK; h++) out[h] = Math.min(1, out[h]);
  return out;
}

/** Per hour of the week, what one load draws (amps at the battery, duty included) parked and driving. */
export type LoadProfile = {
  load: Load;
  ac: boolean;
  runningA: number;
  parkedA: number[];
  drivingA: number[];
  /** Fraction of the hour the load is scheduled, parked and driving (for inverter idle and rating checks). */
  parkedOn: number[];
  drivingOn: number[];
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

export function buildDemandProfile(loads: Load[], systemVoltage: number, inverterEfficiency: number, inverterIdleA = 0): DemandProfile {
  const mk = () => zeros(HOURS_PER_WEEK);
  const profile: DemandProfile = {
    loads: [],
    dcParked: mk(),
    dcDriving: mk(),
    acParked: mk(),
    acDriving: mk(),
    acActiveParked: mk(),
    acActiveDriving: mk(),
    acFloorParked: mk(),
    acFloorDriving: mk(),
    acWattsParked: mk(),
    acWattsDriving: mk(),
  };
  const { dcParked, dcDriving, acParked, acDriving, acActiveParked, acActiveDriving, acFloorParked, acFloorDriving, acWattsParked, acWattsDriving } = profile;
  for (const load of loads) {
    const ac = load.supply === 'ac';
    const runningA = loadRunningCurrentA(load, systemVoltage, inverterEfficiency);
    const amps = runningA * (load.dutyPercent / 100);
    const schedule = scheduleFractions(load);
    // A "driving" load runs whenever the vehicle is driven; the others follow their schedule.
    const parkedOn = load.when === 'driving' ? mk() : schedule;
    const drivingOn = load.when === 'parked' ? mk() : load.when === 'driving' ? zeros(HOURS_PER_WEEK, 1) : schedule;
    const parkedA = mk();
    const drivingA = mk();
    const watts = load.watts !== undefined ? load.watts * load.quantity : runningA * systemVoltage * inverterEfficiency;
    for (let h = 0; h < HOURS_PER_WEEK; h++) {
      const p = parkedOn[h];
      const d = drivingOn[h];
      const pa = amps * p;
      const da = amps * d;
      parkedA[h] = pa;
      drivingA[h] = da;
      if (ac) {
        acParked[h] += pa;
        acDriving[h] += da;
        // Each AC load pays at least the idle current over its own running time (overlaps are counted
        // twice, on the safe side), so adding a load can never lower the inverter's draw.
        acFloorParked[h] += pa > inverterIdleA * p ? pa : inverterIdleA * p;
        acFloorDriving[h] += da > inverterIdleA * d ? da : inverterIdleA * d;
        if (p > acActiveParked[h]) acActiveParked[h] = p;
        if (d > acActiveDriving[h]) acActiveDriving[h] = d;
        if (p > 0) acWattsParked[h] += watts;
        if (d > 0) acWattsDriving[h] += watts;
      } else {
        dcParked[h] += pa;
        dcDriving[h] += da;
      }
    }
    profile.loads.push({ load, ac, runningA, parkedA, drivingA, parkedOn, drivingOn });
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
