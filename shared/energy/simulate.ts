import type { InverterControl, ProjectionInput } from '../schemas/projection';
import { CHEMISTRY_DEFAULTS, MODEL_DEFAULTS, peukertEffectiveCurrent, temperatureFactor } from './defaults';
import { type CalendarInputs, calendarOf } from './calendar';
import * as layout from './profile';
import { type DemandProfile, drivingFractions, solarCurrents, zeros } from './profile';
import { weekdayOf } from './solar';

// Module-level copies: imported bindings are getters once compiled, too slow for the hot loop.
const { HOURS_PER_WEEK, HOUR_STRIDE, PARKED, DRIVING, DC_A, AC_A, AC_ACTIVE, AC_FLOOR_A, AC_WATTS } = layout;
const peukert = peukertEffectiveCurrent;

/** The input with every default filled in: what one run of the model needs, besides the demand profile. */
export type Resolved = {
  systemVoltage: number;
  chemistry: ProjectionInput['battery']['chemistry'];
  role: ProjectionInput['battery']['role'];
  ratedAh: number;
  usableAh: number;
  temperatureC: number;
  temperatureFactor: number;
  ratedHours: number;
  ratedCurrentA: number;
  peukertExponent: number;
  chargeEfficiency: number;
  selfDischargeAPerHour: number;
  selfDischargePercentPerMonth: number;
  cutoffSoc: number;
  startSoc: number;
  bulkAcceptanceA: number;
  taperStartSoc: number;
  taperFloorA: number;
  inverter: null | {
    control: InverterControl;
    efficiency: number;
    idleA: number;
    ratedW: number;
    lvdSoc: number;
    lvdReconnectPoints: number;
  };
  keyOffA: number;
  alternatorA: number;
  drivingMinutesPerDay: number[];
  drivingStartHour: number;
  driving: number[];
  solarW: number;
  peakSunHours: number;
  solarDerate: number;
  solarByHourOfDay: number[];
  shoreByHourOfWeek: number[];
  horizonHours: number;
  startHourOfWeek: number;
} & CalendarInputs;

export function resolve(input: ProjectionInput): Resolved {
  const b = input.battery;
  const chem = CHEMISTRY_DEFAULTS[b.chemistry];
  const tf = b.temperatureFactor ?? temperatureFactor(chem.temperatureCurve, b.temperatureC);
  const usableAh = b.capacityAh * (b.healthPercent / 100) * tf;
  const ratedHours = b.ratedHours ?? MODEL_DEFAULTS.ratedHours;
  const cutoffSoc = b.cutoffSocPercent ?? (b.role === 'starter' ? chem.cutoffSocStarter : chem.cutoffSocHouse);
  const sdPercent = b.selfDischargePercentPerMonth ?? chem.selfDischargePercentPerMonth;
  const ch = input.charging;
  const derate = (ch.solarDeratePercent ?? MODEL_DEFAULTS.solarDerate * 100) / 100;
  const V = input.systemVoltage;
  const inv = input.inverter;
  const shore = zeros(HOURS_PER_WEEK);
  if (ch.shore && ch.shore.amps > 0) {
    for (const day of new Set(ch.shore.weekdays)) {
      let t = day * 24 + ch.shore.startHour;
      let left = ch.shore.hoursPerDay;
      while (left > 1e-12) {
        const part = Math.min(1, left);
        shore[t % HOURS_PER_WEEK] += ch.shore.amps * part;
        left -= part;
        t++;
      }
    }
  }
  return {
    systemVoltage: V,
    chemistry: b.chemistry,
    role: b.role,
    ratedAh: b.capacityAh,
    usableAh,
    temperatureC: b.temperatureC,
    temperatureFactor: tf,
    ratedHours,
    ratedCurrentA: b.capacityAh / ratedHours,
    peukertExponent: b.peukertExponent ?? chem.peukertExponent,
    chargeEfficiency: (b.chargeEfficiencyPercent ?? chem.chargeEfficiency * 100) / 100,
    // Self-discharge is a share of the battery's capacity per month (30 days).
    selfDischargeAPerHour: (usableAh * sdPercent) / 100 / (30 * 24),
    selfDischargePercentPerMonth: sdPercent,
    cutoffSoc,
    startSoc: b.startSocPercent,
    bulkAcceptanceA: (b.bulkAcceptanceC ?? chem.bulkAcceptanceC) * b.capacityAh,
    taperStartSoc: b.taperStartSocPercent ?? chem.taperStartSoc,
    taperFloorA: MODEL_DEFAULTS.taperFloorC * b.capacityAh,
    inverter: inv
      ? {
          control: inv.control,
          efficiency: inv.efficiencyPercent / 100,
          idleA: inv.idleA,
          ratedW: inv.ratedW,
          lvdSoc: inv.lvdSocPercent ?? Math.min(100, cutoffSoc + MODEL_DEFAULTS.lvdPointsAboveCutoff),
          lvdReconnectPoints: inv.lvdReconnectPoints ?? MODEL_DEFAULTS.lvdReconnectPoints,
        }
      : null,
    keyOffA: input.keyOffDrawA,
    alternatorA: ch.alternatorA,
    drivingMinutesPerDay: [...ch.drivingMinutesPerDay],
    drivingStartHour: ch.drivingStartHour,
    driving: drivingFractions(ch.drivingMinutesPerDay, ch.drivingStartHour),
    solarW: ch.solarW,
    peakSunHours: ch.peakSunHours,
    solarDerate: derate,
    solarByHourOfDay: solarCurrents(
      ch.solarW,
      ch.peakSunHours,
      derate,
      V,
      MODEL_DEFAULTS.daylightStartHour,
      MODEL_DEFAULTS.daylightEndHour,
    ),
    shoreByHourOfWeek: shore,
    horizonHours: input.horizonDays * 24,
    startHourOfWeek: (input.start.date ? weekdayOf(input.start.date) : input.start.weekday) * 24 + input.start.hour,
    ...calendarOf(input, derate),
  };
}


/**
 * Per hour: the charge at its end (Ah), and 1 where the inverter was on (else 0). The state of charge,
 * the net change and the minutes driven follow from these and the input (see seriesOf in project.ts).
 */
export type Trace = { ah: number[]; inverterOn: number[] };

export type RunTotals = {
  loadAh: number;
  inverterIdleAh: number;
  keyOffAh: number;
  selfDischargeAh: number;
  chargeAh: number;
  /** Ah of AC loads that were scheduled but could not run because the inverter was off. */
  acNotServedAh: number;
  perLoadAh: number[];
  hours: number;
};

export type RunResult = {
  hoursToCutoff: number | null;
  hoursToFlat: number | null;
  minSoc: number;
  maxAcWatts: number;
  /** Per hour, on request: the charge (Ah) and whether the inverter was on. */
  trace: Trace | null;
  week: RunTotals | null;
};

type RunOptions = {
  withDriving: boolean;
  record?: boolean;
  trackWeek?: boolean;
  hours?: number;
  /** Stop as soon as the cut-off is reached (for the Fixes' searches). */
  untilCutoff?: boolean;
  /** With trackWeek: also the amp-hours of each load (for the breakdown). */
  perLoad?: boolean;
};

/**
 * One run of the model, hour by hour (each hour split into its driving and parked parts), from the start
 * state of charge. Returns the time to the cut-off and to flat, and on request the series and the first
 * week's totals.
 *
 * This is the model's hot loop (a projection runs it twice, the Fixes dozens of times): everything it
 * reads is copied into locals first and the week's sums are kept in locals, so the loop body touches
 * only numbers and arrays of doubles.
 */
export function run(r: Resolved, demand: DemandProfile, opts: RunOptions): RunResult {
  const hours = opts.hours ?? r.horizonHours;
  const full = r.usableAh;
  const cutAh = (r.cutoffSoc / 100) * full;
  let ah = (r.startSoc / 100) * full;
  let hoursToCutoff: number | null = ah <= cutAh + 1e-9 ? 0 : null;
  let hoursToFlat: number | null = ah <= 1e-9 ? 0 : null;
  let minSoc = r.startSoc;
  let maxAcWatts = 0;
  const inv = r.inverter;
  const hasInverter = inv !== null;
  const control = inv ? inv.control : 'always-on';
  const isLvd = hasInverter && control === 'low-voltage-disconnect';
  const idleA = inv ? inv.idleA : 0;
  const lvdSoc = inv ? inv.lvdSoc : 0;
  const lvdReconnectSoc = inv ? inv.lvdSoc + inv.lvdReconnectPoints : 0;
  const lvdAh = (lvdSoc / 100) * full;
  let lvdOn = true;
  const record = opts.record === true;
  // Sized up front (a run that records never stops early).
  const ahs = record ? zeros(hours) : [];
  const inverterOns = record ? zeros(hours) : [];
  const trackWeek = opts.trackWeek ?? false;
  const perLoad = trackWeek && (opts.perLoad ?? true);
  const untilCutoff = opts.untilCutoff === true;
  const withDriving = opts.withDriving;
  let wLoadAh = 0;
  let wIdleAh = 0;
  let wKeyOffAh = 0;
  let wSelfAh = 0;
  let wChargeAh = 0;
  let wNotServedAh = 0;
  // With perLoad: hours of the first week's parts in which DC loads ran (driving, then parked, per hour
  // of the week), and AC loads (only while the inverter was on); each load's amp-hours follow after.
  const ranHours = perLoad ? zeros(4 * HOURS_PER_WEEK) : null;

  const byHour = demand.byHour;
  const drivingByHour = r.driving;
  const solar = r.solarByHourOfDay;
  const shore = r.shoreByHourOfWeek;
  const keyOffA = r.keyOffA;
  const alternatorA = r.alternatorA;
  const selfA = r.selfDischargeAPerHour;
  const ratedA = r.ratedCurrentA;
  const k = r.peukertExponent;
  const efficiency = r.chargeEfficiency;
  const bulkA = r.bulkAcceptanceA;
  const floorA = r.taperFloorA;
  const taperStartSoc = r.taperStartSoc;
  const taperStartAh = (taperStartSoc / 100) * full;
  const taperSpan = Math.max(1e-9, 100 - taperStartSoc);
  // Sub-steps per hour so that efficiency × |d acceptance / d Ah| × step stays at or below 0.5.
  const taperSlope = Math.max(0, bulkA - floorA) / Math.max(1e-9, full - taperStartAh);
  const taperStiffness = (efficiency * taperSlope) / 0.5;
  const startHow = r.startHourOfWeek;
  // Calendar inputs (calendar.ts), per hour of the run, where the input follows dates instead of the week.
  const solarAt = r.solarByHour;
  const shoreAt = r.shoreByHour;
  const drivingAt = r.drivingByHour;

  let minAh = Infinity;
  for (let t = 0, how = startHow % HOURS_PER_WEEK, hod = how % 24; t < hours; t++) {
    if (t > 0) {
      how = how === HOURS_PER_WEEK - 1 ? 0 : how + 1;
      hod = hod === 23 ? 0 : hod + 1;
    }
    const f = withDriving ? (drivingAt !== null ? drivingAt[t] : drivingByHour[how]) : 0;
    const inWeek = trackWeek && t < HOURS_PER_WEEK;
    let inverterOnAny = false;
    const sources = (solarAt !== null ? solarAt[t] : solar[hod]) + (shoreAt !== null ? shoreAt[t] : shore[how]);

    // Driving part first, then parked.
    for (let part = 0; part < 2; part++) {
      const driving = part === 0;
      const partHours = driving ? f : 1 - f;
      if (partHours <= 1e-12) continue;
      const at = how * HOUR_STRIDE + (driving ? DRIVING : PARKED);
      const dc = byHour[at + DC_A];
      const acDemand = byHour[at + AC_A];
      const acActive = byHour[at + AC_ACTIVE];
      const acFloor = byHour[at + AC_FLOOR_A];
      const acWatts = byHour[at + AC_WATTS];
      const keyOff = driving ? 0 : keyOffA;
      const chargeA = sources + (driving ? alternatorA : 0);
      // A low-voltage disconnect opens the moment the charge reaches its threshold, inside the hour:
      // the part is then split there and the rest runs with the inverter off.
      for (let done = 0; partHours - done > 1e-12; ) {
        let dt = partHours - done;
        let acOn = false;
        let idleOn = false;
        if (hasInverter) {
          if (isLvd) {
            const soc = (ah / full) * 100;
            if (lvdOn && soc <= lvdSoc) lvdOn = false;
            else if (!lvdOn && soc >= lvdReconnectSoc) lvdOn = true;
            acOn = idleOn = lvdOn;
          } else if (control === 'always-on') {
            acOn = idleOn = true;
          } else if (control === 'manual-switch') {
            // Switched on only while an AC load runs; its own losses are in the efficiency.
            acOn = true;
          } else {
            acOn = idleOn = driving;
          }
        }
        const ac = acOn ? acDemand : 0;
        // Idle in the part of the hour no AC load runs, and the floor's excess while one runs.
        const idle = (idleOn ? idleA * (1 - acActive) : 0) + (acOn ? acFloor - acDemand : 0);
        const loadA = dc + ac + idle + keyOff;
        if (acOn && acWatts > maxAcWatts) maxAcWatts = acWatts;
        if ((acOn && (idle > 0 || acActive > 0)) || idleOn) inverterOnAny = true;

        let lvdOpens = false;
        if (isLvd && lvdOn && chargeA < loadA) {
          const rate = peukert(loadA - chargeA, ratedA, k) + selfA;
          if (ah > lvdAh && ah - rate * dt < lvdAh) {
            dt = (ah - lvdAh) / rate;
            lvdOpens = true;
          }
        }
        const before = ah;
        let chargeUsedAh: number;
        if (chargeA >= loadA) {
          // In the taper the acceptance falls as the battery fills: short sub-steps keep the
          // integration from overshooting (a lower battery never ends an hour above a fuller one).
          const n = ah >= taperStartAh - 1e-9 || ah + chargeA * dt >= taperStartAh ? Math.min(200, Math.max(1, Math.ceil(taperStiffness * dt))) : 1;
          const h = dt / n;
          const surplus = chargeA - loadA;
          for (let i = 0; i < n; i++) {
            const soc = (ah / full) * 100;
            const acceptance = soc < taperStartSoc ? bulkA : bulkA + (floorA - bulkA) * Math.min(1, (soc - taperStartSoc) / taperSpan);
            const into = surplus < acceptance ? surplus : acceptance;
            ah = Math.min(full, ah + into * efficiency * h);
          }
          chargeUsedAh = loadA * dt + (ah - before);
        } else {
          ah -= peukert(loadA - chargeA, ratedA, k) * dt;
          chargeUsedAh = chargeA * dt;
        }
        ah -= selfA * dt;
        const unclamped = ah;
        if (ah < 0) ah = 0;

        // Interpolate the moment of crossing inside the part-hour.
        if (hoursToCutoff === null && unclamped <= cutAh && before > cutAh) {
          hoursToCutoff = t + (driving ? 0 : f) + done + (dt * (before - cutAh)) / (before - unclamped);
        }
        if (hoursToFlat === null && unclamped <= 1e-9 && before > 0) {
          hoursToFlat = t + (driving ? 0 : f) + done + (dt * before) / Math.max(1e-12, before - unclamped);
        }

        if (inWeek) {
          wLoadAh += (dc + ac) * dt;
          wIdleAh += idle * dt;
          wKeyOffAh += keyOff * dt;
          wSelfAh += selfA * dt;
          wChargeAh += chargeUsedAh;
          if (!acOn) wNotServedAh += acDemand * dt;
          if (ranHours) {
            const at = driving ? how : HOURS_PER_WEEK + how;
            ranHours[at] += dt;
            if (acOn) ranHours[2 * HOURS_PER_WEEK + at] += dt;
          }
        }
        done += dt;
        if (lvdOpens) lvdOn = false;
      }
    }
    if (ah < minAh) minAh = ah;
    if (record) {
      ahs[t] = ah;
      inverterOns[t] = inverterOnAny ? 1 : 0;
    }
    if (untilCutoff && hoursToCutoff !== null) break;
    // Without a series or weekly totals to fill, stop once both answers are known.
    if (!record && (!trackWeek || t >= HOURS_PER_WEEK) && hoursToCutoff !== null && hoursToFlat !== null) break;
  }

  // The lowest state of charge, from the lowest charge ((x / full) × 100 rises with x, so this is exact).
  const lowest = (minAh / full) * 100;
  if (lowest < minSoc) minSoc = lowest;
  let week: RunTotals | null = null;
  if (trackWeek) {
    const perLoadAh = ranHours ? perLoadAmpHours(demand, ranHours) : zeros(demand.loads.length);
    week = {
      loadAh: wLoadAh,
      inverterIdleAh: wIdleAh,
      keyOffAh: wKeyOffAh,
      selfDischargeAh: wSelfAh,
      chargeAh: wChargeAh,
      acNotServedAh: wNotServedAh,
      perLoadAh,
      hours: Math.min(hours, HOURS_PER_WEEK),
    };
  }
  const trace: Trace | null = record ? { ah: ahs, inverterOn: inverterOns } : null;
  return { hoursToCutoff, hoursToFlat, minSoc, maxAcWatts, trace, week };
}

/**
 * Each load's amp-hours over the first week, from the hours its kind ran (ranHours: DC driving, DC
 * parked, AC driving, AC parked, each per hour of the week) and its schedule.
 */
function perLoadAmpHours(demand: DemandProfile, ranHours: number[]): number[] {
  const perLoadAh = zeros(demand.loads.length);
  // Per day, the hours each kind ran (for the loads spread over the day).
  const byDay = zeros(4 * 7);
  for (let k = 0; k < 4; k++) {
    for (let day = 0; day < 7; day++) {
      let sum = 0;
      for (let h = k * HOURS_PER_WEEK + day * 24, end = h + 24; h < end; h++) sum += ranHours[h];
      byDay[k * 7 + day] = sum;
    }
  }
  for (let i = 0; i < demand.loads.length; i++) {
    const lp = demand.loads[i];
    if (lp.hoursPerDay <= 0) continue;
    const d = lp.ac ? 2 : 0;
    const useD = lp.onDriving ? 1 : 0;
    const useP = lp.onParked ? 1 : 0;
    let sum = 0;
    if (lp.startHour < 0) {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        sum += useD * byDay[d * 7 + day] + useP * byDay[(d + 1) * 7 + day];
      }
      sum *= lp.hoursPerDay / 24;
    } else {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        let t = day * 24 + lp.startHour;
        let left = lp.hoursPerDay;
        while (left > 1e-12) {
          const x = left < 1 ? left : 1;
          const h = t % HOURS_PER_WEEK;
          sum += x * (useD * ranHours[d * HOURS_PER_WEEK + h] + useP * ranHours[(d + 1) * HOURS_PER_WEEK + h]);
          left -= x;
          t++;
        }
      }
    }
    perLoadAh[i] = lp.amps * sum;
  }
  return perLoadAh;
}

const SCALES = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000];

export function round(x: number, digits: number): number {
  const m = digits >= 0 && digits < SCALES.length ? SCALES[digits] : 10 ** digits;
  return Math.round(x * m) / m;
}
