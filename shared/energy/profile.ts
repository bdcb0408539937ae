import type { Load } from '../schemas/projection';

export const HOURS_PER_WEEK = 168;

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
export function scheduleFractions(load: Load): Float64Array {
  const out = new Float64Array(HOURS_PER_WEEK);
  const days = load.weekdays ?? [0, 1, 2, 3, 4, 5, 6];
  const hours = load.hoursPerDay;
  for (const day of new Set(days)) {
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
  parkedA: Float64Array;
  drivingA: Float64Array;
  /** Fraction of the hour the load is scheduled, parked and driving (for inverter idle and rating checks). */
  parkedOn: Float64Array;
  drivingOn: Float64Array;
};

/** The week's demand: per hour, DC and AC currents parked and driving, and how much of the hour an AC load runs. */
export type DemandProfile = {
  loads: LoadProfile[];
  dcParked: Float64Array;
  dcDriving: Float64Array;
  acParked: Float64Array;
  acDriving: Float64Array;
  acActiveParked: Float64Array;
  acActiveDriving: Float64Array;
  /** AC draw with the inverter's floor: while a load runs the inverter draws at least its idle current. */
  acFloorParked: Float64Array;
  acFloorDriving: Float64Array;
  acWattsParked: Float64Array;
  acWattsDriving: Float64Array;
};

export function buildDemandProfile(loads: Load[], systemVoltage: number, inverterEfficiency: number, inverterIdleA = 0): DemandProfile {
  const mk = () => new Float64Array(HOURS_PER_WEEK);
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
  for (const load of loads) {
    const ac = load.supply === 'ac';
    const runningA = loadRunningCurrentA(load, systemVoltage, inverterEfficiency);
    const duty = load.dutyPercent / 100;
    const schedule = scheduleFractions(load);
    const parkedOn = mk();
    const drivingOn = mk();
    const parkedA = mk();
    const drivingA = mk();
    const watts = load.watts !== undefined ? load.watts * load.quantity : runningA * systemVoltage * inverterEfficiency;
    for (let h = 0; h < HOURS_PER_WEEK; h++) {
      // A "driving" load runs whenever the vehicle is driven; the others follow their schedule.
      parkedOn[h] = load.when === 'driving' ? 0 : schedule[h];
      drivingOn[h] = load.when === 'parked' ? 0 : load.when === 'driving' ? 1 : schedule[h];
      parkedA[h] = runningA * duty * parkedOn[h];
      drivingA[h] = runningA * duty * drivingOn[h];
      if (ac) {
        profile.acParked[h] += parkedA[h];
        profile.acDriving[h] += drivingA[h];
        // Each AC load pays at least the idle current over its own running time (overlaps are counted
        // twice, on the safe side), so adding a load can never lower the inverter's draw.
        profile.acFloorParked[h] += Math.max(parkedA[h], inverterIdleA * parkedOn[h]);
        profile.acFloorDriving[h] += Math.max(drivingA[h], inverterIdleA * drivingOn[h]);
        profile.acActiveParked[h] = Math.max(profile.acActiveParked[h], parkedOn[h]);
        profile.acActiveDriving[h] = Math.max(profile.acActiveDriving[h], drivingOn[h]);
        if (parkedOn[h] > 0) profile.acWattsParked[h] += watts;
        if (drivingOn[h] > 0) profile.acWattsDriving[h] += watts;
      } else {
        profile.dcParked[h] += parkedA[h];
        profile.dcDriving[h] += drivingA[h];
      }
    }
    profile.loads.push({ load, ac, runningA, parkedA, drivingA, parkedOn, drivingOn });
  }
  return profile;
}

/** Fraction of each hour of the week spent driving: each day's minutes from the start hour on. */
export function drivingFractions(minutesPerDay: readonly number[], startHour: number): Float64Array {
  const out = new Float64Array(HOURS_PER_WEEK);
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
): Float64Array {
  const out = new Float64Array(24);
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
