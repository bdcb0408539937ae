import * as layout from './profile';
import type { DemandProfile } from './profile';
import type { Balance } from './repeating-week';
import type { Resolved } from './resolve';
import { round as roundTo } from './round';
import type { Trace } from './run';

// Module-level copies: imported bindings are getters once compiled, too slow for the series loop.
const HOURS_PER_WEEK = layout.HOURS_PER_WEEK;
const round = roundTo;

export type BreakdownItem = { name: string; kind: 'load' | 'standby'; supply: 'dc' | 'ac' | null; ahPerDay: number; share: number };

export type SeriesPoint = {
  hour: number;
  weekday: number;
  hourOfDay: number;
  socPercent: number;
  parkedSocPercent: number;
  ah: number;
  netA: number;
  drivingMinutes: number;
  inverterOn: boolean;
};

/** What each load and standby draw uses a day in the repeating week, largest first, with its share of the whole. */
export function breakdownOf(r: Resolved, demand: DemandProfile, balance: Balance, perDay: number): BreakdownItem[] {
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
export function seriesOf(r: Resolved, trace: Trace, parkedAh: number[]): SeriesPoint[] {
  const horizon = r.horizonHours;
  const full = r.usableAh;
  const series: SeriesPoint[] = new Array(horizon);
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
