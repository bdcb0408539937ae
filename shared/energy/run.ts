import * as charge from './charge';
import * as layout from './profile';
import { type DemandProfile, peukertExtras, peukertFactor, zeros } from './profile';
import type { Resolved } from './resolve';
import { perLoadAmpHours } from './per-load';
import type { RunOptions, RunResult, RunTotals, Trace } from './run-types';

export type { RunOptions, RunResult, RunTotals, Trace } from './run-types';

// Module-level copies: imported bindings are getters once compiled, too slow for the hot loop.
const { HOURS_PER_WEEK, HOUR_STRIDE, PARKED, DRIVING, DC_A, AC_A, AC_ACTIVE, AC_WATTS } = layout;
const chargeFor = charge.chargeFor;
const timeToReach = charge.timeToReach;

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
  // Calendar inputs (calendar.ts), per hour of the run, where the input follows dates instead of the week.
  const solarAt = r.solarByHour;
  const shoreAt = r.shoreByHour;
  const drivingAt = r.drivingByHour;

  let minAh = Infinity;
  let maxAh = ah;
  for (let t = 0, how = startHow % HOURS_PER_WEEK, hod = how % 24; t < hours; t++) {
    if (t > 0) {
      how = how === HOURS_PER_WEEK - 1 ? 0 : how + 1;
      hod = hod === 23 ? 0 : hod + 1;
    }
    // A dated drive (a trip's) charges from its start: the relay's join delay is left to the weekly routine.
    const f = withDriving ? (drivingAt !== null ? drivingAt[t] : drivingByHour[how]) : 0;
    const j = withDriving ? (drivingAt !== null ? drivingAt[t] : joinedByHour[how]) : 0;
    const inWeek = trackWeek && t < HOURS_PER_WEEK;
    let inverterOnAny = false;
    const sources = (solarAt !== null ? solarAt[t] : solar[hod]) + (shoreAt !== null ? shoreAt[t] : shore[how]);

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
