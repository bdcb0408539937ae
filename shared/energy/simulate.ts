import type { InverterControl, ProjectionInput } from '../schemas/projection';
import { CHEMISTRY_DEFAULTS, MODEL_DEFAULTS, starterCutoffSoc, temperatureFactor } from './defaults';
import * as layout from './profile';
import { type DemandProfile, drivingFractions, peukertExtras, peukertFactor, solarCurrents, zeros } from './profile';

// Module-level copies: imported bindings are getters once compiled, too slow for the hot loop.
const { HOURS_PER_WEEK, HOUR_STRIDE, PARKED, DRIVING, DC_A, AC_A, AC_ACTIVE, AC_WATTS } = layout;

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
  /** LiFePO4 below 0 °C: its protection system blocks charging (common practice). */
  frozen: boolean;
  selfHeating: boolean;
  heaterA: number;
  heaterWarmupHours: number;
  charger: 'relay' | 'dc-dc';
  /** Taper start while the alternator charges (a DC-DC charger holds its current to 95 %). */
  alternatorTaperStartSoc: number;
  relayJoinMinutes: number;
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
  /** Fraction of each hour of the week the alternator charges (driving, once a relay has joined). */
  joined: number[];
  solarW: number;
  peakSunHours: number;
  solarDerate: number;
  solarByHourOfDay: number[];
  shoreByHourOfWeek: number[];
  horizonHours: number;
  startHourOfWeek: number;
};

const LEAD_ACID = new Set(['flooded', 'agm', 'gel']);

export function resolve(input: ProjectionInput): Resolved {
  const b = input.battery;
  const chem = CHEMISTRY_DEFAULTS[b.chemistry];
  const tf = b.temperatureFactor ?? temperatureFactor(chem.temperatureCurve, b.temperatureC);
  const usableAh = b.capacityAh * (b.healthPercent / 100) * tf;
  const ratedHours = b.ratedHours ?? MODEL_DEFAULTS.ratedHours;
  const cutoffSoc = b.cutoffSocPercent ?? (b.role === 'starter' ? starterCutoffSoc(chem.cutoffSocStarter, b.temperatureC) : chem.cutoffSocHouse);
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
  // Cold lead-acid accepts less charge: its acceptance falls with its capacity (model choice, docs/model.md).
  const acceptanceFactor = LEAD_ACID.has(b.chemistry) ? tf : 1;
  const taperStartSoc = b.taperStartSocPercent ?? chem.taperStartSoc;
  const relayJoinMinutes = ch.charger === 'relay' ? (ch.relayJoinMinutes ?? MODEL_DEFAULTS.relayJoinMinutes) : 0;
  const driving = drivingFractions(ch.drivingMinutesPerDay, ch.drivingStartHour);
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
    bulkAcceptanceA: (b.bulkAcceptanceC ?? chem.bulkAcceptanceC) * b.capacityAh * acceptanceFactor,
    taperStartSoc,
    taperFloorA: MODEL_DEFAULTS.taperFloorC * b.capacityAh * acceptanceFactor,
    frozen: b.chemistry === 'lifepo4' && b.temperatureC < 0,
    selfHeating: b.selfHeating,
    heaterA: (b.heaterW ?? MODEL_DEFAULTS.heaterW) / V,
    heaterWarmupHours: (b.heaterWarmupMinutes ?? MODEL_DEFAULTS.heaterWarmupMinutes) / 60,
    charger: ch.charger,
    alternatorTaperStartSoc: ch.charger === 'dc-dc' ? Math.max(taperStartSoc, MODEL_DEFAULTS.dcdcTaperStartSoc) : taperStartSoc,
    relayJoinMinutes,
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
    driving,
    joined: relayJoinMinutes > 0 ? drivingFractions(ch.drivingMinutesPerDay, ch.drivingStartHour, relayJoinMinutes) : driving,
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

/**
 * Charge stored in dt hours from a surplus current S (A) at the battery, from ah: the acceptance is bulkA
 * below the taper start and falls linearly to floorA at full, times the charge efficiency e. The linear
 * taper has a closed form (the acceptance decays exponentially once it is below the surplus), so the
 * answer does not depend on the step.
 */
export function chargeFor(ah: number, S: number, dt: number, e: number, bulkA: number, floorA: number, tsAh: number, full: number): number {
  if (S <= 0 || dt <= 0 || ah >= full) return ah >= full ? full : ah;
  const span = full - tsAh;
  const slope = span > 1e-9 ? (bulkA - floorA) / span : 0;
  // Below the taper: at e × min(S, bulk) until the taper starts.
  if (ah < tsAh) {
    const rate = e * (S < bulkA ? S : bulkA);
    const t1 = (tsAh - ah) / rate;
    if (t1 >= dt) return ah + rate * dt;
    ah = tsAh;
    dt -= t1;
  }
  if (slope <= 0) {
    const rate = e * (S < bulkA ? S : bulkA);
    return Math.min(full, ah + rate * dt);
  }
  // In the taper with the surplus below the acceptance: linear at e × S until they meet.
  let u = bulkA - slope * (ah - tsAh);
  if (S < u) {
    const meet = S > floorA ? tsAh + (bulkA - S) / slope : full;
    const t2 = (meet - ah) / (e * S);
    if (t2 >= dt) return Math.min(full, ah + e * S * dt);
    if (meet >= full) return full;
    ah = meet;
    dt -= t2;
    u = S;
  }
  // The acceptance u decays as du/dt = −slope × e × u until it reaches the floor (full).
  const rate = slope * e;
  const toFull = Math.log(u / floorA) / rate;
  if (dt >= toFull) return full;
  u *= Math.exp(-rate * dt);
  return Math.min(full, tsAh + (bulkA - u) / slope);
}

/**
 * How long (at most dt) charging from ah at a surplus S takes to reach target, self-discharge included:
 * bisection on the closed-form charge, which rises with time. A module-level function so that the hot
 * loop's variables stay off the heap (a closure there would capture them).
 */
function timeToReach(target: number, ah: number, S: number, dt: number, e: number, bulkA: number, floorA: number, tsAh: number, full: number, selfA: number): number {
  if (chargeFor(ah, S, dt, e, bulkA, floorA, tsAh, full) - selfA * dt < target) return dt;
  let lo = 0;
  let hi = dt;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (chargeFor(ah, S, mid, e, bulkA, floorA, tsAh, full) - selfA * mid >= target) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * Per hour: the charge at its end (Ah), and 1 where the inverter was on (else 0). The state of charge,
 * the net change and the minutes driven follow from these and the input (see seriesOf in project.ts).
 */
export type Trace = { ah: number[]; inverterOn: number[] };

export type RunTotals = {
  /** Loads, Peukert's extra included. */
  loadAh: number;
  inverterIdleAh: number;
  keyOffAh: number;
  selfDischargeAh: number;
  /** Put back: what the charging sources supplied to the loads or stored in the battery. */
  chargeAh: number;
  /** What the charging sources offered; the rest of it was not stored (battery full, acceptance, frost, losses). */
  offeredAh: number;
  /** Of the offer, what a self-heating battery's heater used while it warmed. */
  heatingAh: number;
  /** Ah of AC loads that were scheduled but could not run because the inverter was off. */
  acNotServedAh: number;
  perLoadAh: number[];
  hours: number;
};

export type RunResult = {
  hoursToCutoff: number | null;
  hoursToFlat: number | null;
  /** When a low-voltage disconnect first opened, in hours from the start. */
  hoursToLvdOpen: number | null;
  minSoc: number;
  maxAcWatts: number;
  /** Per hour, on request: the charge (Ah) and whether the inverter was on. */
  trace: Trace | null;
  week: RunTotals | null;
  /** The charge at the end, the highest charge, and the disconnect's state at the end (for the next week). */
  endAh: number;
  maxAh: number;
  lvdOn: boolean;
};

export type RunOptions = {
  withDriving: boolean;
  record?: boolean;
  trackWeek?: boolean;
  hours?: number;
  /** Stop as soon as the cut-off is reached (for the Fixes' searches). */
  untilCutoff?: boolean;
  /** With trackWeek: also the amp-hours of each load (for the breakdown). */
  perLoad?: boolean;
  /** Start here instead of the input's start: charge (Ah), hour of the week, the disconnect's state. */
  startAh?: number;
  startHow?: number;
  lvdOn?: boolean;
  /** Steps per hour (1 by default): for the check that a finer step changes no figure. */
  substeps?: number;
};

/**
 * One run of the model, hour by hour (each hour split into its driving part before the alternator
 * joins, its charging drive and its parked part), from the start state of charge. Returns the time to
 * the cut-off and to flat, and on request the series and the first week's totals.
 *
 * This is the model's hot loop (a projection runs it a few times, the Fixes dozens of times): everything
 * it reads is copied into locals first and the week's sums are kept in locals, so the loop body touches
 * only numbers and arrays of doubles.
 */
export function run(r: Resolved, demand: DemandProfile, opts: RunOptions): RunResult {
  const hours = opts.hours ?? r.horizonHours;
  const full = r.usableAh;
  const cutAh = (r.cutoffSoc / 100) * full;
  let ah = opts.startAh ?? (r.startSoc / 100) * full;
  const startSoc = (ah / full) * 100;
  let hoursToCutoff: number | null = ah <= cutAh + 1e-9 ? 0 : null;
  let hoursToFlat: number | null = ah <= 1e-9 ? 0 : null;
  let hoursToLvdOpen: number | null = null;
  let minSoc = startSoc;
  let maxAcWatts = 0;
  const inv = r.inverter;
  const hasInverter = inv !== null;
  const control = inv ? inv.control : 'always-on';
  const isLvd = hasInverter && control === 'low-voltage-disconnect';
  const isManual = control === 'manual-switch';
  const isAlways = control === 'always-on';
  const idleA = inv ? inv.idleA : 0;
  const lvdSoc = inv ? inv.lvdSoc : 0;
  const lvdReconnectSoc = inv ? inv.lvdSoc + inv.lvdReconnectPoints : 0;
  const lvdAh = (lvdSoc / 100) * full;
  let lvdOn = opts.lvdOn ?? true;
  const record = opts.record === true;
  // Sized up front (a run that records never stops early).
  const ahs = record ? zeros(hours) : [];
  const inverterOns = record ? zeros(hours) : [];
  const trackWeek = opts.trackWeek ?? false;
  const perLoad = trackWeek && (opts.perLoad ?? true);
  const untilCutoff = opts.untilCutoff === true;
  const withDriving = opts.withDriving;
  const maxStep = 1 / Math.max(1, opts.substeps ?? 1);
  let wLoadAh = 0;
  let wIdleAh = 0;
  let wKeyOffAh = 0;
  let wSelfAh = 0;
  let wChargeAh = 0;
  let wOfferedAh = 0;
  let wHeatAh = 0;
  let wNotServedAh = 0;
  // With perLoad: hours of the first week's parts in which DC loads ran (driving, then parked, per hour
  // of the week), and AC loads (only while the inverter was on); then the same weighted by the share of
  // the demand the battery supplied (for Peukert's extra). Each load's amp-hours follow after.
  const ranHours = perLoad ? zeros(8 * HOURS_PER_WEEK) : null;

  const byHour = demand.byHour;
  const ratedA = r.ratedCurrentA;
  const k = r.peukertExponent;
  const extras = peukertExtras(demand, ratedA, k);
  const idleX = peukertFactor(idleA, ratedA, k) - 1;
  const keyOffX = peukertFactor(r.keyOffA, ratedA, k) - 1;
  const drivingByHour = r.driving;
  const joinedByHour = r.joined;
  const solar = r.solarByHourOfDay;
  const shore = r.shoreByHourOfWeek;
  const keyOffA = r.keyOffA;
  const alternatorA = r.alternatorA;
  const selfA = r.selfDischargeAPerHour;
  const efficiency = r.chargeEfficiency;
  const bulkA = r.bulkAcceptanceA;
  const floorA = r.taperFloorA;
  const taperStartAh = (r.taperStartSoc / 100) * full;
  const altTaperStartAh = (r.alternatorTaperStartSoc / 100) * full;
  const frozen = r.frozen;
  const heats = frozen && r.selfHeating;
  const heaterA = r.heaterA;
  const warmupH = r.heaterWarmupHours;
  let warmH = 0;
  const startHow = opts.startHow ?? r.startHourOfWeek;

  let minAh = Infinity;
  let maxAh = ah;
  for (let t = 0, how = startHow % HOURS_PER_WEEK, hod = how % 24; t < hours; t++) {
    if (t > 0) {
      how = how === HOURS_PER_WEEK - 1 ? 0 : how + 1;
      hod = hod === 23 ? 0 : hod + 1;
    }
    const f = withDriving ? drivingByHour[how] : 0;
    const j = withDriving ? joinedByHour[how] : 0;
    const inWeek = trackWeek && t < HOURS_PER_WEEK;
    let inverterOnAny = false;
    const sources = solar[hod] + shore[how];

    // The drive before the alternator joins, the drive with it, then parked.
    for (let part = 0, partStart = 0; part < 3; part++) {
      const partHours = part === 0 ? f - j : part === 1 ? j : 1 - f;
      const offset = partStart;
      partStart += partHours > 0 ? partHours : 0;
      if (partHours <= 1e-12) continue;
      const driving = part < 2;
      const at = how * HOUR_STRIDE + (driving ? DRIVING : PARKED);
      const dc = byHour[at + DC_A];
      const acDemand = byHour[at + AC_A];
      const acActive = byHour[at + AC_ACTIVE];
      const acWatts = byHour[at + AC_WATTS];
      const xi = how * 4 + (driving ? 2 : 0);
      const dcX = extras === null ? 0 : extras[xi];
      const acX = extras === null ? 0 : extras[xi + 1];
      const keyOff = driving ? 0 : keyOffA;
      const chargeA = sources + (part === 1 ? alternatorA : 0);
      const tsAh = part === 1 ? altTaperStartAh : taperStartAh;
      // A low-voltage disconnect opens the moment the charge reaches its threshold, and a heater finishes
      // warming, inside the hour: the part is then split there.
      for (let done = 0; partHours - done > 1e-12; ) {
        let dt = partHours - done;
        if (dt > maxStep) dt = maxStep;
        let acOn = false;
        let idleOn = 0;
        if (hasInverter) {
          if (isLvd) {
            const soc = (ah / full) * 100;
            if (lvdOn && soc <= lvdSoc) lvdOn = false;
            else if (!lvdOn && soc >= lvdReconnectSoc) lvdOn = true;
            acOn = lvdOn;
            idleOn = lvdOn ? 1 : 0;
          } else if (isAlways) {
            acOn = true;
            idleOn = 1;
          } else if (isManual) {
            // Switched on for the part of the hour an AC load is scheduled: idle and loads then.
            acOn = true;
            idleOn = acActive;
          } else {
            acOn = driving;
            idleOn = driving ? 1 : 0;
          }
        }
        // While powered the inverter draws its idle current plus its AC loads (the practitioners' estimate).
        const ac = acOn ? acDemand : 0;
        const idle = idleA * idleOn;
        const loadA = dc + ac + idle + keyOff;
        const extraA = dcX + (acOn ? acX : 0) + idle * idleX + keyOff * keyOffX;
        if (acOn && acWatts > maxAcWatts) maxAcWatts = acWatts;
        if (idleOn > 0) inverterOnAny = true;

        const net = loadA - chargeA;
        // The share of the demand the battery supplies: Peukert's extra applies to that share only.
        const share = net > 0 ? net / loadA : 0;
        let heating = 0;
        let lvdOpens = false;
        if (net > 0 || chargeA <= 0) warmH = 0;
        if (net > 0) {
          if (isLvd && lvdOn) {
            const rate = net + extraA * share + selfA;
            if (ah > lvdAh && ah - rate * dt < lvdAh) {
              dt = (ah - lvdAh) / rate;
              lvdOpens = true;
            }
          }
        } else if (isLvd && !lvdOn && net < 0 && (!frozen || (heats && warmH >= warmupH))) {
          // An open disconnect closes the moment the charge reaches its reconnect level: split there
          // (found by bisection on the closed-form charge, which rises with time).
          const reconnectAh = (lvdReconnectSoc / 100) * full;
          if (ah < reconnectAh) dt = timeToReach(reconnectAh, ah, -net, dt, efficiency, bulkA, floorA, tsAh, full, selfA);
        } else if (heats && warmH < warmupH) {
          // A self-heating battery warms itself from the surplus first, and takes no charge meanwhile.
          if (dt > warmupH - warmH) dt = warmupH - warmH;
          heating = -net < heaterA ? -net : heaterA;
          warmH += dt;
        }
        const before = ah;
        let chargeUsedAh: number;
        if (net <= 0) {
          if ((!frozen || (heats && heating === 0)) && net < 0) {
            ah = chargeFor(ah, -net, dt, efficiency, bulkA, floorA, tsAh, full);
          }
          chargeUsedAh = loadA * dt + (ah - before);
        } else {
          ah -= (net + extraA * share) * dt;
          chargeUsedAh = chargeA * dt;
        }
        ah -= selfA * dt;
        const unclamped = ah;
        if (ah < 0) ah = 0;
        if (ah > maxAh) maxAh = ah;

        // Interpolate the moment of crossing inside the part-hour.
        if (hoursToCutoff === null && unclamped <= cutAh && before > cutAh) {
          hoursToCutoff = t + offset + done + (dt * (before - cutAh)) / (before - unclamped);
        }
        if (hoursToFlat === null && unclamped <= 1e-9 && before > 0) {
          hoursToFlat = t + offset + done + (dt * before) / Math.max(1e-12, before - unclamped);
        }

        if (inWeek) {
          wLoadAh += (dc + ac + (dcX + (acOn ? acX : 0)) * share) * dt;
          wIdleAh += idle * (1 + idleX * share) * dt;
          wKeyOffAh += keyOff * (1 + keyOffX * share) * dt;
          wSelfAh += selfA * dt;
          wChargeAh += chargeUsedAh;
          wOfferedAh += chargeA * dt;
          wHeatAh += heating * dt;
          if (!acOn) wNotServedAh += acDemand * dt;
          if (ranHours) {
            const at = driving ? how : HOURS_PER_WEEK + how;
            ranHours[at] += dt;
            ranHours[4 * HOURS_PER_WEEK + at] += dt * share;
            if (acOn) {
              ranHours[2 * HOURS_PER_WEEK + at] += dt;
              ranHours[6 * HOURS_PER_WEEK + at] += dt * share;
            }
          }
        }
        done += dt;
        if (lvdOpens) {
          lvdOn = false;
          if (hoursToLvdOpen === null) hoursToLvdOpen = t + offset + done;
        }
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
    const perLoadAh = ranHours ? perLoadAmpHours(demand, ranHours, ratedA, k) : zeros(demand.loads.length);
    week = {
      loadAh: wLoadAh,
      inverterIdleAh: wIdleAh,
      keyOffAh: wKeyOffAh,
      selfDischargeAh: wSelfAh,
      chargeAh: wChargeAh,
      offeredAh: wOfferedAh,
      heatingAh: wHeatAh,
      acNotServedAh: wNotServedAh,
      perLoadAh,
      hours: Math.min(hours, HOURS_PER_WEEK),
    };
  }
  const trace: Trace | null = record ? { ah: ahs, inverterOn: inverterOns } : null;
  return { hoursToCutoff, hoursToFlat, hoursToLvdOpen, minSoc, maxAcWatts, trace, week, endAh: ah, maxAh, lvdOn };
}

export type Balance = {
  /** True when the repeating week no longer falls and stays above the cut-off. */
  holds: boolean;
  week: RunTotals;
  /** Weeks run to find it. */
  weeks: number;
};

/**
 * The repeating week of the routine, independent of the hour and the charge the projection starts from:
 * weeks from Monday 00:00, the first from a full battery, each from the end of the one before, until the
 * state at the same hour a week later no longer falls (the routine holds if that week stays above the
 * cut-off), the cut-off is reached, the battery keeps falling below its taper (every week then falls by
 * the same amount), or the longest run is used up. The week returned is the last one run.
 */
export function repeatingWeek(r: Resolved, demand: DemandProfile, perLoad: boolean, substeps?: number): Balance {
  return weeksFromFull(r, demand, { perLoad, substeps, track: true }) as Balance;
}

/** Whether the routine's repeating week holds (as repeatingWeek, without the week's totals: for the Fixes' searches). */
export function routineHolds(r: Resolved, demand: DemandProfile): boolean {
  return weeksFromFull(r, demand, { perLoad: false, track: false }).holds;
}

function weeksFromFull(r: Resolved, demand: DemandProfile, o: { perLoad: boolean; substeps?: number; track: boolean }): { holds: boolean; week: RunTotals | null; weeks: number } {
  const full = r.usableAh;
  const tol = MODEL_DEFAULTS.holdsTolerance * full;
  const maxWeeks = Math.ceil((MODEL_DEFAULTS.maxRunDays * 24) / HOURS_PER_WEEK);
  const isLvd = r.inverter?.control === 'low-voltage-disconnect';
  const taperAh = (Math.min(r.taperStartSoc, r.alternatorTaperStartSoc) / 100) * full;
  let x = full;
  let lvdOn = true;
  for (let w = 1; ; w++) {
    const res = run(r, demand, {
      withDriving: true,
      trackWeek: o.track,
      perLoad: o.perLoad,
      untilCutoff: !o.track,
      hours: HOURS_PER_WEEK,
      startAh: x,
      startHow: 0,
      lvdOn,
      substeps: o.substeps,
    });
    const week = res.week;
    if (res.hoursToCutoff !== null) return { holds: false, week, weeks: w };
    if (res.endAh >= x - tol) return { holds: true, week, weeks: w };
    // Below the taper the week's charge does not depend on the level: it falls as much every week.
    if (w >= maxWeeks || (!isLvd && res.maxAh < taperAh - 1e-9)) return { holds: false, week, weeks: w };
    x = res.endAh;
    lvdOn = res.lvdOn;
  }
}

/**
 * Each load's amp-hours over the first week, from the hours its kind ran (ranHours: DC driving, DC
 * parked, AC driving, AC parked, each per hour of the week, then the same weighted by the battery's
 * share of the demand), its schedule and Peukert's factor at its running current.
 */
function perLoadAmpHours(demand: DemandProfile, ranHours: number[], ratedA: number, k: number): number[] {
  const perLoadAh = zeros(demand.loads.length);
  // Per day, the hours each kind ran (for the loads spread over the day).
  const byDay = zeros(8 * 7);
  for (let kind = 0; kind < 8; kind++) {
    for (let day = 0; day < 7; day++) {
      let sum = 0;
      for (let h = kind * HOURS_PER_WEEK + day * 24, end = h + 24; h < end; h++) sum += ranHours[h];
      byDay[kind * 7 + day] = sum;
    }
  }
  for (let i = 0; i < demand.loads.length; i++) {
    const lp = demand.loads[i];
    if (lp.hoursPerDay <= 0) continue;
    const x = peukertFactor(lp.runningA, ratedA, k) - 1;
    const d = lp.ac ? 2 : 0;
    const useD = lp.onDriving ? 1 : 0;
    const useP = lp.onParked ? 1 : 0;
    let sum = 0;
    let shared = 0;
    if (lp.startHour < 0) {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        sum += useD * byDay[d * 7 + day] + useP * byDay[(d + 1) * 7 + day];
        shared += useD * byDay[(d + 4) * 7 + day] + useP * byDay[(d + 5) * 7 + day];
      }
      sum *= lp.hoursPerDay / 24;
      shared *= lp.hoursPerDay / 24;
    } else {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        let t = day * 24 + lp.startHour;
        let left = lp.hoursPerDay;
        while (left > 1e-12) {
          const y = left < 1 ? left : 1;
          const h = t % HOURS_PER_WEEK;
          sum += y * (useD * ranHours[d * HOURS_PER_WEEK + h] + useP * ranHours[(d + 1) * HOURS_PER_WEEK + h]);
          shared += y * (useD * ranHours[(d + 4) * HOURS_PER_WEEK + h] + useP * ranHours[(d + 5) * HOURS_PER_WEEK + h]);
          left -= y;
          t++;
        }
      }
    }
    perLoadAh[i] = lp.amps * (sum + x * shared);
  }
  return perLoadAh;
}

const SCALES = [1, 10, 100, 1000, 10_000, 100_000, 1_000_000];

export function round(x: number, digits: number): number {
  const m = digits >= 0 && digits < SCALES.length ? SCALES[digits] : 10 ** digits;
  return Math.round(x * m) / m;
}
