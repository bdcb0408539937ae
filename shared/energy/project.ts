import type { CompareInput, Load, ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import { type Fix, findFixes, toDays } from './fixes';
import { solarReport } from './calendar';
import { buildDemandProfile, type DemandProfile, HOURS_PER_WEEK as WEEK } from './profile';
import { type Balance, repeatingWeek } from './repeating-week';
import { resolve, type Resolved } from './resolve';
import { round as roundTo, run, type Trace } from './simulate';
import { collectWarnings, type Warning } from './warnings';

export type { Fix, FixKind, FixStops } from './fixes';
export { fixGainText } from './fixes';
export type { Warning } from './warnings';

// Module-level copies: imported bindings are getters once compiled, too slow for the series loop.
const HOURS_PER_WEEK = WEEK;
const round = roundTo;

export type MarginState = 'comfortable' | 'tight' | 'short';

export type DaysFigure = { daysToCutoff: number | null; daysToFlat: number | null };
export type BreakdownItem = { name: string; kind: 'load' | 'standby'; supply: 'dc' | 'ac' | null; ahPerDay: number; share: number };

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
  /** days: to the cut-off on the routine minus the stay; atLeastDays where the cut-off lies beyond the run. */
  margin: { days: number | null; atLeastDays: number | null; state: MarginState; plannedStayDays: number; coveredDays: number };
  /** The chart's first point: the state of charge the projection starts from. */
  start: { socPercent: number; weekday: number; hourOfDay: number };
  series: {
    hour: number;
    weekday: number;
    hourOfDay: number;
    socPercent: number;
    parkedSocPercent: number;
    ah: number;
    netA: number;
    drivingMinutes: number;
    inverterOn: boolean;
  }[];
  warnings: Warning[];
  fixes: Fix[];
  /** The solar amp-hours of each day of the horizon, and whether they come from the place and date. */
  solar: ReturnType<typeof solarReport>;
  assumptions: Record<string, number | string | boolean | null>;
  horizonDays: number;
  cutoffSocPercent: number;
};

export function marginState(days: number | null, plannedStayDays: number): MarginState {
  if (days === null) return 'comfortable';
  if (days < 0) return 'short';
  const tight = Math.max(MODEL_DEFAULTS.tightMarginMinDays, MODEL_DEFAULTS.tightMarginShareOfStay * plannedStayDays);
  return days < tight ? 'tight' : 'comfortable';
}

/** Hours the routine is run: the horizon, or far enough to see the stay and its tight margin (up to 60 days). */
export function coverHoursOf(input: ProjectionInput): number {
  const stay = input.plannedStayDays;
  const tight = Math.max(MODEL_DEFAULTS.tightMarginMinDays, MODEL_DEFAULTS.tightMarginShareOfStay * stay);
  const days = Math.min(MODEL_DEFAULTS.maxRunDays, Math.max(input.horizonDays, Math.ceil(stay + tight + 1)));
  return days * 24;
}

function installedLoads(loads: Load[]) {
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

/** The margin on the planned stay: from the cut-off on the routine, or a lower bound where it lies beyond the run. */
function marginOf(input: ProjectionInput, routineCut: number | null, holds: boolean, coverDays: number): Projection['margin'] {
  const stay = input.plannedStayDays;
  const base = { plannedStayDays: stay, coveredDays: coverDays };
  if (routineCut !== null) {
    const days = round(routineCut - stay, 2);
    return { ...base, days, atLeastDays: null, state: marginState(days, stay) };
  }
  // No cut-off on the run: "none" is Comfortable only when the routine holds; otherwise the run's end
  // bounds the margin from below.
  if (holds) return { ...base, days: null, atLeastDays: null, state: 'comfortable' };
  const atLeastDays = round(coverDays - stay, 2);
  return { ...base, days: null, atLeastDays, state: marginState(atLeastDays, stay) };
}

/** What each load and standby draw uses a day in the repeating week, largest first, with its share of the whole. */
function breakdownOf(r: Resolved, demand: DemandProfile, balance: Balance, perDay: number): BreakdownItem[] {
  const week = balance.week;
  // Built as the final objects (the raw amp-hours first, rounded once the total is known).
  const breakdown: BreakdownItem[] = [];
  const item = (name: string, kind: BreakdownItem['kind'], supply: BreakdownItem['supply'], ahPerDay: number) =>
    breakdown.push({ name, kind, supply, ahPerDay, share: 0 });
  for (let i = 0; i < demand.loads.length; i++) item(demand.loads[i].load.name, 'load', demand.loads[i].load.supply, week.perLoadAh[i] * perDay);
  if (r.inverter) item('Inverter idle', 'standby', null, week.inverterIdleAh * perDay);
  if (r.keyOffA > 0) item('Key-off draw', 'standby', null, week.keyOffAh * perDay);
  item('Self-discharge', 'standby', null, week.selfDischargeAh * perDay);
  let total = 0;
  for (const x of breakdown) total += x.ahPerDay;
  for (const x of breakdown) {
    x.share = total > 0 ? round(x.ahPerDay / total, 4) : 0;
    x.ahPerDay = round(x.ahPerDay, 2);
  }
  // Largest first, ties in input order: an insertion sort, several times quicker than Array.sort with a
  // comparator on a few dozen items.
  for (let i = 1; i < breakdown.length; i++) {
    const x = breakdown[i];
    let j = i - 1;
    while (j >= 0 && breakdown[j].ahPerDay < x.ahPerDay) {
      breakdown[j + 1] = breakdown[j];
      j--;
    }
    breakdown[j + 1] = x;
  }

  return breakdown;
}

/** The hour-by-hour points of the answer, from the routine's trace and the parked run's charge. */
function seriesOf(r: Resolved, trace: Trace, parkedAh: number[]): Projection['series'] {
  const horizon = r.horizonHours;
  const full = r.usableAh;
  const series: Projection['series'] = new Array(horizon);
  const { ah, inverterOn } = trace;
  let before = (r.startSoc / 100) * full;
  // Rounded in line (x100 and x1000): this loop makes every hour's point of the answer. The state of
  // charge is worked out exactly as the run works it out.
  for (let i = 0, how = r.startHourOfWeek + 1; i < horizon; i++, how++) {
    const inWeek = how % HOURS_PER_WEEK;
    const now = ah[i];
    series[i] = {
      hour: i + 1,
      weekday: (inWeek / 24) | 0,
      hourOfDay: how % 24,
      socPercent: Math.round(((now / full) * 100) * 100) / 100,
      parkedSocPercent: Math.round(((parkedAh[i] / full) * 100) * 100) / 100,
      ah: Math.round(now * 100) / 100,
      netA: Math.round((now - before) * 1000) / 1000,
      drivingMinutes: Math.round((r.drivingByHour !== null ? r.drivingByHour[i] : r.driving[(r.startHourOfWeek + i) % HOURS_PER_WEEK]) * 60),
      inverterOn: inverterOn[i] === 1,
    };
    before = now;
  }
  return series;
}

export type CompareSide = {
  daysParked: number | null;
  daysOnRoutine: number | null;
  dailyAh: number;
  netAh: number;
  marginDays: number | null;
  marginState: MarginState;
};
export type Comparison = {
  without: CompareSide;
  with: CompareSide;
  delta: { daysParked: number | null; daysOnRoutine: number | null; dailyAh: number; netAh: number };
  candidates: { name: string; ahPerDay: number }[];
  warnings: Warning[];
};

/** Try a load: the rig without and with its candidate loads, side by side. */
export function compare({ rig, candidates }: CompareInput): Comparison {
  const tried = [...rig.loads.filter((l) => l.status === 'candidate'), ...candidates].map((l) => ({ ...l, status: 'installed' as const }));
  const without = project(rig, { fixes: false });
  const withRig: ProjectionInput = { ...rig, loads: [...installedLoads(rig.loads), ...tried] };
  const withLoads = project(withRig, { fixes: false });
  const side = (p: Projection): CompareSide => ({
    daysParked: p.parked.daysToCutoff,
    daysOnRoutine: p.routine.daysToCutoff,
    dailyAh: p.daily.consumptionAh,
    netAh: p.daily.netAh,
    marginDays: p.margin.days,
    marginState: p.margin.state,
  });
  const h = rig.horizonDays;
  const d = (a: number | null, b: number | null) => (a === null && b === null ? null : round((b ?? h) - (a ?? h), 2));
  const names = new Set(tried.map((l) => l.name));
  return {
    without: side(without),
    with: side(withLoads),
    delta: {
      daysParked: d(without.parked.daysToCutoff, withLoads.parked.daysToCutoff),
      daysOnRoutine: d(without.routine.daysToCutoff, withLoads.routine.daysToCutoff),
      dailyAh: round(withLoads.daily.consumptionAh - without.daily.consumptionAh, 2),
      netAh: round(withLoads.daily.netAh - without.daily.netAh, 2),
    },
    candidates: withLoads.breakdown.filter((b) => b.kind === 'load' && names.has(b.name)).map((b) => ({ name: b.name, ahPerDay: b.ahPerDay })),
    warnings: withLoads.warnings,
  };
}
