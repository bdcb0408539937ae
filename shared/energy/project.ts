import type { CompareInput, Load, ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import { solarReport } from './calendar';
import { buildDemandProfile, type DemandProfile, HOURS_PER_WEEK as WEEK } from './profile';
import { resolve, type Resolved, round as roundTo, run, type RunTotals, type Trace } from './simulate';

// Module-level copies: imported bindings are getters once compiled, too slow for the series loop.
const HOURS_PER_WEEK = WEEK;
const round = roundTo;

export type MarginState = 'comfortable' | 'tight' | 'short';
export type FixKind = 'cutoff-switch' | 'ignition-relay' | 'low-voltage-disconnect' | 'more-driving' | 'more-battery' | 'solar';

export type DaysFigure = { daysToCutoff: number | null; daysToFlat: number | null };
export type Warning = { code: string; message: string };
export type Fix = {
  kind: FixKind;
  daysGainedParked: number;
  daysGainedRoutine: number;
  ahPerDaySaved: number;
  summary: string;
  convenience: string;
  /** The change the Fix makes, for the form that applies it. */
  change: Record<string, unknown>;
  /** True when, with the Fix, the routine no longer reaches the cut-off within the horizon. */
  holds: boolean;
};
export type BreakdownItem = { name: string; kind: 'load' | 'standby'; supply: 'dc' | 'ac' | null; ahPerDay: number; share: number };

export type Projection = {
  parked: DaysFigure;
  routine: DaysFigure & { holds: boolean };
  daily: { consumptionAh: number; chargeAh: number; netAh: number };
  standby: { inverterIdleAh: number; keyOffAh: number; selfDischargeAh: number };
  breakdown: BreakdownItem[];
  margin: { days: number | null; state: MarginState; plannedStayDays: number };
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
  assumptions: Record<string, number | string | null>;
  horizonDays: number;
  cutoffSocPercent: number;
};

const toDays = (hours: number | null, horizonHours: number) =>
  hours === null || hours > horizonHours + 1e-9 ? null : round(hours / 24, 2);

export function marginState(days: number | null, plannedStayDays: number): MarginState {
  if (days === null) return 'comfortable';
  if (days < 0) return 'short';
  const tight = Math.max(MODEL_DEFAULTS.tightMarginMinDays, MODEL_DEFAULTS.tightMarginShareOfStay * plannedStayDays);
  return days < tight ? 'tight' : 'comfortable';
}

function installedLoads(loads: Load[]) {
  return loads.filter((l) => l.status === 'installed');
}

/** Days to cut-off on the routine alone (for the Fixes' searches). */
function routineDays(r: Resolved, demand: DemandProfile) {
  return toDays(run(r, demand, { withDriving: true, untilCutoff: true }).hoursToCutoff, r.horizonHours);
}

/** The figures Fixes compare: days to cut-off parked and on the routine. */
function quickDays(r: Resolved, demand: DemandProfile) {
  const p = run(r, demand, { withDriving: false, untilCutoff: true });
  const q = run(r, demand, { withDriving: true, untilCutoff: true });
  return { parked: toDays(p.hoursToCutoff, r.horizonHours), routine: toDays(q.hoursToCutoff, r.horizonHours) };
}

/** The model's full answer for a rig: candidate loads are left out (see compare for Try a load). */
export function project(input: ProjectionInput, options: { fixes?: boolean } = {}): Projection {
  const loads = installedLoads(input.loads);
  const r = resolve(input);
  const demand = buildDemandProfile(loads, r.systemVoltage, r.inverter?.efficiency ?? 1, r.inverter?.idleA ?? 0);
  const horizon = r.horizonHours;

  const parkedRun = run(r, demand, { withDriving: false, record: true });
  const weekHours = Math.max(horizon, HOURS_PER_WEEK);
  const routineRun = run(r, demand, { withDriving: true, record: true, trackWeek: true, hours: weekHours });
  const week = routineRun.week!;
  const perDay = 24 / week.hours;

  const parked = { daysToCutoff: toDays(parkedRun.hoursToCutoff, horizon), daysToFlat: toDays(parkedRun.hoursToFlat, horizon) };
  const consumptionAh = (week.loadAh + week.inverterIdleAh + week.keyOffAh + week.selfDischargeAh) * perDay;
  const chargeAh = week.chargeAh * perDay;
  const daily = { consumptionAh: round(consumptionAh, 2), chargeAh: round(chargeAh, 2), netAh: round(chargeAh - consumptionAh, 2) };
  const routineCut = toDays(routineRun.hoursToCutoff, horizon);
  const routine = {
    daysToCutoff: routineCut,
    daysToFlat: toDays(routineRun.hoursToFlat, horizon),
    holds: routineCut === null && daily.netAh >= 0,
  };
  const standby = {
    inverterIdleAh: round(week.inverterIdleAh * perDay, 2),
    keyOffAh: round(week.keyOffAh * perDay, 2),
    selfDischargeAh: round(week.selfDischargeAh * perDay, 2),
  };

  const breakdown = breakdownOf(r, demand, week, perDay);

  const marginDays = routineCut === null ? null : round(routineCut - input.plannedStayDays, 2);
  const margin = { days: marginDays, state: marginState(marginDays, input.plannedStayDays), plannedStayDays: input.plannedStayDays };

  const series = seriesOf(r, routineRun.trace!, parkedRun.trace!.ah);

  const warnings = collectWarnings(input, r, demand, parkedRun.minSoc, routineRun.minSoc, Math.max(parkedRun.maxAcWatts, routineRun.maxAcWatts), week.acNotServedAh * perDay);
  const fixes = options.fixes === false ? [] : findFixes(input, r, demand, { parked: parked.daysToCutoff, routine: routineCut }, daily.netAh);

  return {
    parked,
    routine,
    daily,
    standby,
    breakdown,
    margin,
    series,
    warnings,
    fixes,
    solar: solarReport(r),
    horizonDays: input.horizonDays,
    cutoffSocPercent: r.cutoffSoc,
    assumptions: {
      systemVoltage: r.systemVoltage,
      usableAh: round(r.usableAh, 2),
      temperatureFactor: round(r.temperatureFactor, 3),
      peukertExponent: r.peukertExponent,
      ratedHours: r.ratedHours,
      chargeEfficiency: r.chargeEfficiency,
      selfDischargePercentPerMonth: r.selfDischargePercentPerMonth,
      cutoffSocPercent: r.cutoffSoc,
      bulkAcceptanceA: round(r.bulkAcceptanceA, 2),
      taperStartSocPercent: r.taperStartSoc,
      inverterEfficiency: r.inverter?.efficiency ?? null,
      lvdSocPercent: r.inverter?.lvdSoc ?? null,
      solarDerate: r.solarDerate,
    },
  };
}

/** What each load and standby draw uses a day, largest first, with its share of the whole. */
function breakdownOf(r: Resolved, demand: DemandProfile, week: RunTotals, perDay: number): BreakdownItem[] {
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

function collectWarnings(
  input: ProjectionInput,
  r: Resolved,
  demand: DemandProfile,
  parkedMinSoc: number,
  routineMinSoc: number,
  maxAcWatts: number,
  acNotServedAhPerDay: number,
): Warning[] {
  const warnings: Warning[] = [];
  const inv = r.inverter;
  if (inv?.control === 'ignition-relay') {
    const cut = demand.loads.filter((lp) => lp.ac && lp.runsParked).map((lp) => lp.load.name);
    if (cut.length) {
      warnings.push({
        code: 'ac-loads-cut-while-parked',
        message: `On an ignition relay the inverter is off while parked, so ${listNames(cut)} cannot run then (${round(acNotServedAhPerDay, 1)} Ah a day not served).`,
      });
    }
  }
  if (r.role === 'starter' && Math.min(parkedMinSoc, routineMinSoc) < r.cutoffSoc) {
    warnings.push({
      code: 'starter-below-reserve',
      message: `The starting battery is projected below its cranking reserve of ${r.cutoffSoc} %: the engine may not start.`,
    });
  }
  if (inv && maxAcWatts > inv.ratedW) {
    warnings.push({
      code: 'inverter-overloaded',
      message: `AC loads scheduled together draw up to ${round(maxAcWatts, 0)} W, more than the inverter's ${inv.ratedW} W rating.`,
    });
  }
  const charges = r.alternatorA > 0 || r.solarW > 0 || r.shoreByHourOfWeek.some((x) => x > 0);
  if (r.chemistry === 'lifepo4' && r.temperatureC < 0 && charges) {
    warnings.push({
      code: 'lifepo4-cold-charge',
      message: 'A LiFePO4 battery must not be charged below 0 °C: check that its protection system blocks charging, or warm it first.',
    });
  }
  if (input.battery.temperatureC < -18 && r.chemistry !== 'lifepo4') {
    warnings.push({ code: 'temperature-below-table', message: 'Below -18 °C the capacity factor is held at its -18 °C value; real capacity may be lower.' });
  }
  if (input.plannedStayDays > input.horizonDays) {
    warnings.push({ code: 'stay-beyond-horizon', message: 'The planned stay is longer than the horizon: lengthen the horizon to see the whole stay.' });
  }
  return warnings;
}

function listNames(names: string[]) {
  return names.length <= 1 ? (names[0] ?? '') : `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}

/** Smallest x in [lo, hi] (to within step) for which ok(x) holds, or null; ok must be monotone. */
function searchMin(lo: number, hi: number, step: number, ok: (x: number) => boolean): number | null {
  if (!ok(hi)) return null;
  if (ok(lo)) return lo;
  while (hi - lo > step) {
    const mid = (lo + hi) / 2;
    if (ok(mid)) hi = mid;
    else lo = mid;
  }
  return Math.ceil(hi / step) * step;
}

function findFixes(
  input: ProjectionInput,
  r: Resolved,
  demand: DemandProfile,
  base: { parked: number | null; routine: number | null },
  baseNetAh: number,
): Fix[] {
  const horizonDays = input.horizonDays;
  const gained = (before: number | null, after: number | null) => round((after ?? horizonDays) - (before ?? horizonDays), 2);
  const fixes: Fix[] = [];
  const netWith = (changed: ProjectionInput) => {
    const rc = resolve(changed);
    const w = run(rc, demand, { withDriving: true, trackWeek: true, perLoad: false, hours: Math.max(rc.horizonHours, HOURS_PER_WEEK) }).week!;
    return round(((w.chargeAh - w.loadAh - w.inverterIdleAh - w.keyOffAh - w.selfDischargeAh) * 24) / w.hours, 2);
  };
  const push = (fix: Omit<Fix, 'daysGainedParked' | 'daysGainedRoutine' | 'ahPerDaySaved' | 'holds'>, after: { parked: number | null; routine: number | null }, changed: ProjectionInput) => {
    const daysGainedParked = gained(base.parked, after.parked);
    const daysGainedRoutine = gained(base.routine, after.routine);
    if (daysGainedParked <= 0.01 && daysGainedRoutine <= 0.01) return;
    fixes.push({ ...fix, daysGainedParked, daysGainedRoutine, ahPerDaySaved: round(netWith(changed) - baseNetAh, 2), holds: after.routine === null });
  };
  const withControl = (control: NonNullable<ProjectionInput['inverter']>['control']): ProjectionInput => ({
    ...input,
    inverter: input.inverter ? { ...input.inverter, control } : null,
  });
  const acNames = demand.loads.filter((lp) => lp.ac).map((lp) => lp.load.name);
  const acParkedNames = demand.loads.filter((lp) => lp.ac && lp.runsParked).map((lp) => lp.load.name);

  if (input.inverter && input.inverter.control !== 'manual-switch') {
    const changed = withControl('manual-switch');
    push(
      {
        kind: 'cutoff-switch',
        summary: `Fit a manual cut-off switch on the inverter feed and switch it on only when an AC load runs: no more ${input.inverter.idleA} A idle draw.`,
        convenience: acNames.length ? `You switch the inverter on before using ${listNames(acNames)}.` : 'You switch the inverter on when you need it.',
        change: { inverter: { control: 'manual-switch' } },
      },
      quickDays(resolve(changed), demand),
      changed,
    );
  }
  if (input.inverter && input.inverter.control !== 'ignition-relay') {
    const changed = withControl('ignition-relay');
    push(
      {
        kind: 'ignition-relay',
        summary: 'Feed the inverter through an ignition-keyed relay so it is live only while the vehicle runs.',
        convenience: acParkedNames.length
          ? `${listNames(acParkedNames)} would no longer run while parked.`
          : 'Nothing you use while parked is cut.',
        change: { inverter: { control: 'ignition-relay' } },
      },
      quickDays(resolve(changed), demand),
      changed,
    );
  }
  if (input.inverter && input.inverter.control !== 'low-voltage-disconnect') {
    const changed = withControl('low-voltage-disconnect');
    const rr = resolve(changed);
    push(
      {
        kind: 'low-voltage-disconnect',
        summary: `Put a low-voltage disconnect on the inverter: it switches off at ${rr.inverter!.lvdSoc} % and leaves the rest for the DC loads.`,
        convenience: 'AC loads stop when the battery runs low, until it is charged again.',
        change: { inverter: { control: 'low-voltage-disconnect', lvdSocPercent: rr.inverter!.lvdSoc } },
      },
      quickDays(rr, demand),
      changed,
    );
  }

  const routineFalls = base.routine !== null;
  if (routineFalls && r.alternatorA > 0) {
    const withMinutes = (m: number): ProjectionInput => ({
      ...input,
      charging: { ...input.charging, drivingMinutesPerDay: input.charging.drivingMinutesPerDay.map((x) => Math.max(x, m)) },
    });
    const minutes = searchMin(0, 480, 5, (m) => routineDays(resolve(withMinutes(m)), demand) === null);
    if (minutes !== null && minutes > 0) {
      const changed = withMinutes(minutes);
      push(
        {
          kind: 'more-driving',
          summary: `Drive at least ${minutes} minutes every day: the alternator then puts back what the week uses.`,
          convenience: `${minutes} minutes behind the wheel each day, parked or not.`,
          change: { charging: { drivingMinutesPerDay: changed.charging.drivingMinutesPerDay } },
        },
        quickDays(resolve(changed), demand),
        changed,
      );
    }
  }

  if (input.plannedStayDays > 0 && base.routine !== null && base.routine < input.plannedStayDays) {
    const withCapacity = (ah: number): ProjectionInput => ({ ...input, battery: { ...input.battery, capacityAh: ah } });
    const reach = (ah: number) => {
      const d = routineDays(resolve(withCapacity(ah)), demand);
      return d === null || d >= input.plannedStayDays;
    };
    const needed = searchMin(input.battery.capacityAh, Math.min(20_000, input.battery.capacityAh * 20), 10, reach);
    if (needed !== null && needed > input.battery.capacityAh) {
      const changed = withCapacity(needed);
      push(
        {
          kind: 'more-battery',
          summary: `A battery bank of about ${needed} Ah (${needed - input.battery.capacityAh} Ah more) covers the planned ${input.plannedStayDays}-day stay.`,
          convenience: 'Cost, weight and space for the extra battery, and a charging source to refill it.',
          change: { battery: { capacityAh: needed } },
        },
        quickDays(resolve(changed), demand),
        changed,
      );
    }
  }

  if (routineFalls) {
    // With a place and dates, the panels get that place's sun (peak sun hours left at 0), not a fixed figure.
    const bySun = r.solarByHour !== null;
    const psh = bySun ? 0 : input.charging.peakSunHours > 0 ? input.charging.peakSunHours : MODEL_DEFAULTS.fixPeakSunHours;
    const withSolar = (w: number): ProjectionInput => ({ ...input, charging: { ...input.charging, solarW: w, peakSunHours: psh } });
    const watts = searchMin(input.charging.solarW, 3000, 10, (w) => routineDays(resolve(withSolar(w)), demand) === null);
    if (watts !== null && watts > input.charging.solarW) {
      const changed = withSolar(watts);
      push(
        {
          kind: 'solar',
          summary: `About ${watts} W of solar${input.charging.solarW ? ` (${watts - input.charging.solarW} W more)` : ''} ${bySun ? 'in the sun of this place and season' : `at ${psh} peak sun hours`} balances the week.`,
          convenience: 'Roof space and a charge controller; less in cloud and in winter.',
          change: { charging: { solarW: watts, peakSunHours: psh } },
        },
        quickDays(resolve(changed), demand),
        changed,
      );
    }
  }

  return fixes.sort((a, b) => b.daysGainedRoutine - a.daysGainedRoutine || b.daysGainedParked - a.daysGainedParked);
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
