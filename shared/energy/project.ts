import type { Load, ProjectionInput } from '../schemas/projection';
import { solarReport } from './calendar';
import { type Fix, findFixes } from './fixes';
import { type Margin, coverHoursOf, marginOf } from './margin';
import { buildDemandProfile } from './profile';
import { repeatingWeek } from './repeating-week';
import { resolve } from './resolve';
import * as rounding from './round';
import { run } from './run';
import { type BreakdownItem, breakdownOf, type SeriesPoint, seriesOf } from './series';
import { collectWarnings, type Warning } from './warnings';

// The model's answer for a rig, put together: resolve the input (resolve.ts), run it parked, on the routine
// and over its repeating week (run.ts, repeating-week.ts), then the series and breakdown (series.ts), the
// margin (margin.ts), the warnings (warnings.ts) and the Fixes (fixes.ts). Try a load is in compare.ts.

export type { Fix, FixKind, FixStops } from './fixes';
export { fixGainText } from './fixes';
export { type MarginState, marginState } from './margin';
export type { BreakdownItem } from './series';
export type { Warning } from './warnings';

// Module-level copies: imported bindings are getters once compiled, and the answer rounds a few dozen figures.
const { round, toDays } = rounding;

export type DaysFigure = { daysToCutoff: number | null; daysToFlat: number | null };

export type Projection = {
  /** Days are counted over the run that covers the planned stay (the horizon, or longer: margin.coveredDays). */
  parked: DaysFigure;
  routine: DaysFigure & { holds: boolean };
  /** Per day of the routine's repeating week. */
  daily: { consumptionAh: number; chargeAh: number; netAh: number; offeredAh: number; notStoredAh: number };
  /** The repeating week's balance: used, put back, and offered by the sources but not stored. */
  balance: { holds: boolean; usedAh: number; putBackAh: number; offeredAh: number; notStoredAh: number; heatingAh: number; weeksRun: number };
  standby: { inverterIdleAh: number; keyOffAh: number; selfDischargeAh: number };
  breakdown: BreakdownItem[];
  margin: Margin;
  /** The chart's first point: the state of charge the projection starts from. */
  start: { socPercent: number; weekday: number; hourOfDay: number };
  series: SeriesPoint[];
  warnings: Warning[];
  fixes: Fix[];
  /** The solar amp-hours of each day of the horizon, and whether they come from the place and date. */
  solar: ReturnType<typeof solarReport>;
  assumptions: Record<string, number | string | boolean | null>;
  horizonDays: number;
  cutoffSocPercent: number;
};

export function installedLoads(loads: Load[]) {
  return loads.filter((l) => l.status === 'installed');
}

/** The model's full answer for a rig: candidate loads are left out (see compare for Try a load). */
export function project(input: ProjectionInput, options: { fixes?: boolean; substeps?: number } = {}): Projection {
  const loads = installedLoads(input.loads);
  const r = resolve(input);
  const demand = buildDemandProfile(loads, r.systemVoltage, r.inverter?.efficiency ?? 1);
  const horizon = r.horizonHours;
  const cover = coverHoursOf(input);
  const substeps = options.substeps;

  const parkedRun = run(r, demand, { withDriving: false, record: true, hours: cover, substeps });
  const routineRun = run(r, demand, { withDriving: true, record: true, hours: cover, substeps });
  const balance = repeatingWeek(r, demand, true, substeps);
  const week = balance.week;
  const perDay = 24 / week.hours;

  const parked = { daysToCutoff: toDays(parkedRun.hoursToCutoff, cover), daysToFlat: toDays(parkedRun.hoursToFlat, cover) };
  const usedAh = week.loadAh + week.inverterIdleAh + week.keyOffAh + week.selfDischargeAh;
  const consumptionAh = usedAh * perDay;
  const chargeAh = week.chargeAh * perDay;
  const daily = {
    consumptionAh: round(consumptionAh, 2),
    chargeAh: round(chargeAh, 2),
    netAh: round(chargeAh - consumptionAh, 2),
    offeredAh: round(week.offeredAh * perDay, 2),
    notStoredAh: round((week.offeredAh - week.chargeAh) * perDay, 2),
  };
  const routineCut = toDays(routineRun.hoursToCutoff, cover);
  const routine = { daysToCutoff: routineCut, daysToFlat: toDays(routineRun.hoursToFlat, cover), holds: balance.holds };
  const standby = {
    inverterIdleAh: round(week.inverterIdleAh * perDay, 2),
    keyOffAh: round(week.keyOffAh * perDay, 2),
    selfDischargeAh: round(week.selfDischargeAh * perDay, 2),
  };

  const breakdown = breakdownOf(r, demand, balance, perDay);
  const margin = marginOf(input, routineCut, balance.holds, cover / 24);
  const series = seriesOf(r, routineRun.trace!, parkedRun.trace!.ah);
  const warnings = collectWarnings(input, r, demand, {
    parkedMinSoc: parkedRun.minSoc,
    routineMinSoc: routineRun.minSoc,
    maxAcWatts: Math.max(parkedRun.maxAcWatts, routineRun.maxAcWatts),
    acNotServedAhPerDay: week.acNotServedAh * perDay,
    coverDays: cover / 24,
  });
  const fixes = options.fixes === false ? [] : findFixes(input, r, demand, { parked: parked.daysToCutoff, routine: routineCut, balance }, { horizonHours: horizon, coverHours: cover });

  return {
    parked,
    routine,
    daily,
    balance: {
      holds: balance.holds,
      usedAh: round(usedAh, 2),
      putBackAh: round(week.chargeAh, 2),
      offeredAh: round(week.offeredAh, 2),
      notStoredAh: round(week.offeredAh - week.chargeAh, 2),
      heatingAh: round(week.heatingAh, 2),
      weeksRun: balance.weeks,
    },
    standby,
    breakdown,
    margin,
    start: { socPercent: r.startSoc, weekday: Math.floor(r.startHourOfWeek / 24), hourOfDay: r.startHourOfWeek % 24 },
    series,
    warnings,
    fixes,
    solar: solarReport(r),
    horizonDays: input.horizonDays,
    cutoffSocPercent: round(r.cutoffSoc, 2),
    assumptions: {
      systemVoltage: r.systemVoltage,
      usableAh: round(r.usableAh, 2),
      temperatureFactor: round(r.temperatureFactor, 3),
      peukertExponent: r.peukertExponent,
      ratedHours: r.ratedHours,
      chargeEfficiency: r.chargeEfficiency,
      selfDischargePercentPerMonth: r.selfDischargePercentPerMonth,
      cutoffSocPercent: round(r.cutoffSoc, 2),
      bulkAcceptanceA: round(r.bulkAcceptanceA, 2),
      taperStartSocPercent: r.taperStartSoc,
      charger: r.charger,
      alternatorTaperStartSocPercent: r.alternatorTaperStartSoc,
      relayJoinMinutes: r.relayJoinMinutes,
      chargeBlockedByFrost: r.frozen && !r.selfHeating,
      selfHeating: r.frozen && r.selfHeating,
      heaterA: r.frozen && r.selfHeating ? round(r.heaterA, 2) : null,
      inverterEfficiency: r.inverter?.efficiency ?? null,
      lvdSocPercent: r.inverter?.lvdSoc ?? null,
      solarDerate: r.solarDerate,
    },
  };
}
