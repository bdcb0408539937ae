import { MODEL_DEFAULTS } from './defaults';
import type { DemandProfile } from './profile';
import type { Resolved } from './resolve';
import { run, type RunTotals } from './run';

const HOURS_PER_WEEK = 168;

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
