import type { InverterControl, ProjectionInput } from '../schemas/projection';
import { CHEMISTRY_DEFAULTS, MODEL_DEFAULTS, peukertEffectiveCurrent, temperatureFactor } from './defaults';
import { type DemandProfile, drivingFractions, HOURS_PER_WEEK as WEEK, solarCurrents, zeros } from './profile';

// Module-level copies: imported bindings are getters once compiled, too slow for the hot loop.
const HOURS_PER_WEEK = WEEK;
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
};

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
    startHourOfWeek: input.start.weekday * 24 + input.start.hour,
  };
}


export type Trace = { soc: number[]; ah: number[]; netA: number[]; drivingMinutes: number[]; inverterOn: boolean[] };

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
  /** Per hour, on request: state of charge (%), Ah, net current, minutes driven, inverter on. */
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
  let lvdOn = true;
  const trace: Trace | null = opts.record ? { soc: [], ah: [], netA: [], drivingMinutes: [], inverterOn: [] } : null;
  const trackWeek = opts.trackWeek ?? false;
  const perLoad = opts.perLoad ?? true;
  const week: RunTotals | null = trackWeek
    ? {
        loadAh: 0,
        inverterIdleAh: 0,
        keyOffAh: 0,
        selfDischargeAh: 0,
        chargeAh: 0,
        acNotServedAh: 0,
        perLoadAh: zeros(demand.loads.length),
        hours: Math.min(hours, HOURS_PER_WEEK),
      }
    : null;

  const acceptance = (ahNow: number) => {
    const soc = (ahNow / full) * 100;
    if (soc < r.taperStartSoc) return r.bulkAcceptanceA;
    const x = (soc - r.taperStartSoc) / Math.max(1e-9, 100 - r.taperStartSoc);
    return r.bulkAcceptanceA + (r.taperFloorA - r.bulkAcceptanceA) * Math.min(1, x);
  };
  const taperStartAh = (r.taperStartSoc / 100) * full;
  // Sub-steps per hour so that efficiency × |d acceptance / d Ah| × step stays at or below 0.5.
  const taperSlope = Math.max(0, r.bulkAcceptanceA - r.taperFloorA) / Math.max(1e-9, full - taperStartAh);
  const taperStiffness = (r.chargeEfficiency * taperSlope) / 0.5;

  for (let t = 0; t < hours; t++) {
    const how = (r.startHourOfWeek + t) % HOURS_PER_WEEK;
    const hod = how % 24;
    const f = opts.withDriving ? r.driving[how] : 0;
    const inWeek = trackWeek && t < HOURS_PER_WEEK;
    const ahAtHourStart = ah;
    let inverterOnAny = false;
    const sources = r.solarByHourOfDay[hod] + r.shoreByHourOfWeek[how];

    // Driving part first, then parked.
    for (let part = 0; part < 2; part++) {
      const driving = part === 0;
      const partHours = driving ? f : 1 - f;
      // A low-voltage disconnect opens the moment the charge reaches its threshold, inside the hour:
      // the part is then split there and the rest runs with the inverter off.
      for (let done = 0; partHours - done > 1e-12; ) {
        let dt = partHours - done;
        let acOn = false;
        let idleOn = false;
        if (inv) {
          if (inv.control === 'low-voltage-disconnect') {
            const soc = (ah / full) * 100;
            if (lvdOn && soc <= inv.lvdSoc) lvdOn = false;
            else if (!lvdOn && soc >= inv.lvdSoc + inv.lvdReconnectPoints) lvdOn = true;
            acOn = idleOn = lvdOn;
          } else if (inv.control === 'always-on') {
            acOn = idleOn = true;
          } else if (inv.control === 'manual-switch') {
            // Switched on only while an AC load runs; its own losses are in the efficiency.
            acOn = true;
          } else {
            acOn = idleOn = driving;
          }
        }
        const dc = driving ? demand.dcDriving[how] : demand.dcParked[how];
        const acDemand = driving ? demand.acDriving[how] : demand.acParked[how];
        const acActive = driving ? demand.acActiveDriving[how] : demand.acActiveParked[how];
        const acFloor = driving ? demand.acFloorDriving[how] : demand.acFloorParked[how];
        const ac = acOn ? acDemand : 0;
        // Idle in the part of the hour no AC load runs, and the floor's excess while one runs.
        const idle = (inv && idleOn ? inv.idleA * (1 - acActive) : 0) + (acOn ? acFloor - acDemand : 0);
        const keyOff = driving ? 0 : r.keyOffA;
        const loadA = dc + ac + idle + keyOff;
        if (acOn) {
          const w = driving ? demand.acWattsDriving[how] : demand.acWattsParked[how];
          if (w > maxAcWatts) maxAcWatts = w;
        }
        if (acOn && (idle > 0 || acActive > 0)) inverterOnAny = true;
        if (inv && idleOn) inverterOnAny = true;

        const chargeA = sources + (driving ? r.alternatorA : 0);
        let lvdOpens = false;
        if (inv && inv.control === 'low-voltage-disconnect' && lvdOn && chargeA < loadA) {
          const lvdAh = (inv.lvdSoc / 100) * full;
          const rate = peukert(loadA - chargeA, r.ratedCurrentA, r.peukertExponent) + r.selfDischargeAPerHour;
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
          for (let k = 0; k < n; k++) {
            const into = Math.min(chargeA - loadA, acceptance(ah));
            ah = Math.min(full, ah + into * r.chargeEfficiency * h);
          }
          chargeUsedAh = loadA * dt + (ah - before);
        } else {
          const deficit = loadA - chargeA;
          ah -= peukert(deficit, r.ratedCurrentA, r.peukertExponent) * dt;
          chargeUsedAh = chargeA * dt;
        }
        ah -= r.selfDischargeAPerHour * dt;
        const unclamped = ah;
        if (ah < 0) ah = 0;

        // Interpolate the moment of crossing inside the part-hour.
        const t0 = t + (driving ? 0 : f) + done;
        if (hoursToCutoff === null && unclamped <= cutAh && before > cutAh) {
          hoursToCutoff = t0 + (dt * (before - cutAh)) / (before - unclamped);
        }
        if (hoursToFlat === null && unclamped <= 1e-9 && before > 0) {
          hoursToFlat = t0 + (dt * before) / Math.max(1e-12, before - unclamped);
        }

        if (week && inWeek) {
          week.loadAh += (dc + ac) * dt;
          week.inverterIdleAh += idle * dt;
          week.keyOffAh += keyOff * dt;
          week.selfDischargeAh += r.selfDischargeAPerHour * dt;
          week.chargeAh += chargeUsedAh;
          if (!acOn) week.acNotServedAh += acDemand * dt;
          for (let i = 0; perLoad && i < demand.loads.length; i++) {
            const lp = demand.loads[i];
            if (lp.ac && !acOn) continue;
            week.perLoadAh[i] += (driving ? lp.drivingA[how] : lp.parkedA[how]) * dt;
          }
        }
        done += dt;
        if (lvdOpens) lvdOn = false;
      }
    }
    const soc = (ah / full) * 100;
    if (soc < minSoc) minSoc = soc;
    if (trace) {
      trace.soc.push(soc);
      trace.ah.push(ah);
      trace.netA.push(ah - ahAtHourStart);
      trace.drivingMinutes.push(f * 60);
      trace.inverterOn.push(inverterOnAny);
    }
    if (opts.untilCutoff && hoursToCutoff !== null) break;
    // Without a series or weekly totals to fill, stop once both answers are known.
    if (!trace && (!week || t >= HOURS_PER_WEEK) && hoursToCutoff !== null && hoursToFlat !== null) break;
  }
  return { hoursToCutoff, hoursToFlat, minSoc, maxAcWatts, trace, week };
}

export function round(x: number, digits: number): number {
  const m = 10 ** digits;
  return Math.round(x * m) / m;
}
