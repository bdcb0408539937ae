import type { ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import { round } from './round';

export type MarginState = 'comfortable' | 'tight' | 'short';

/** days: to the cut-off on the routine minus the stay; atLeastDays where the cut-off lies beyond the run. */
export type Margin = { days: number | null; atLeastDays: number | null; state: MarginState; plannedStayDays: number; coveredDays: number };

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

/** The margin on the planned stay: from the cut-off on the routine, or a lower bound where it lies beyond the run. */
export function marginOf(input: ProjectionInput, routineCut: number | null, holds: boolean, coverDays: number): Margin {
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
