import type { ProjectionInput } from '../schemas/projection';
import { FIX_CANDIDATES, type FixContext, type FixDraft, type FixKind, type FixStops } from './fix-candidates';
import type { DemandProfile } from './profile';
import { type Balance, repeatingWeek } from './repeating-week';
import { resolve, type Resolved } from './resolve';
import { round, toDays } from './round';
import { run } from './run';
import { listNames } from './words';

export type { FixKind, FixStops } from './fix-candidates';

export type Fix = {
  kind: FixKind;
  /** Lower bounds where outlastsHorizon says so: the gain reaches the end of the run. */
  daysGainedParked: number;
  daysGainedRoutine: number;
  /** True where, with the Fix, the battery outlasts the horizon (the gain is then "outlasts the horizon", not a number). */
  outlastsHorizon: { parked: boolean; routine: boolean };
  ahPerDaySaved: number;
  summary: string;
  convenience: string;
  /** The change the Fix makes, for the form that applies it. */
  change: Record<string, unknown>;
  /** True when, with the Fix, the routine's repeating week holds. */
  holds: boolean;
  stops: FixStops | null;
  /** True when the Fix stops a load marked essential. */
  cutsEssential: boolean;
  /** The figures in the summary, for texts that follow the unit setting. */
  figures: Record<string, number | string | null>;
};

/** A Fix's gain in words: "outlasts the horizon" where it reaches the end of the run, else the days. */
export function fixGainText(fix: Pick<Fix, 'daysGainedRoutine' | 'daysGainedParked' | 'outlastsHorizon' | 'holds'>): string {
  const routine = fix.holds ? 'the routine holds' : fix.outlastsHorizon.routine ? 'outlasts the horizon on your routine' : `+${fix.daysGainedRoutine.toFixed(1)} days on your routine`;
  const parked = fix.outlastsHorizon.parked ? 'outlasts the horizon parked' : fix.daysGainedParked > 0 ? `+${fix.daysGainedParked.toFixed(1)} days parked` : '';
  return parked ? `${routine}, ${parked}` : routine;
}

type Base = FixContext['base'];
type Runs = { horizonHours: number; coverHours: number };

const usedPerDay = (b: Balance) => (b.week.loadAh + b.week.inverterIdleAh + b.week.keyOffAh + b.week.selfDischargeAh) / 7;

/**
 * The Fixes for a rig: each candidate of FIX_CANDIDATES that applies is run with its change (parked and on
 * the routine, and its repeating week), and kept where it gains time; the best first.
 */
export function findFixes(input: ProjectionInput, r: Resolved, demand: DemandProfile, base: Base, runs: Runs): Fix[] {
  const { coverHours } = runs;
  const coverDays = coverHours / 24;
  const baseUsed = usedPerDay(base.balance);
  const basePutBack = base.balance.week.chargeAh / 7;
  const acLoads = demand.loads.filter((lp) => lp.ac);
  const context: FixContext = {
    input,
    r,
    demand,
    base,
    coverHours,
    acNames: acLoads.map((lp) => lp.load.name),
    acParkedNames: acLoads.filter((lp) => lp.runsParked).map((lp) => lp.load.name),
    essentialNames: new Set(demand.loads.filter((lp) => lp.load.essential).map((lp) => lp.load.name)),
  };

  /** The draft's Fix, or null where it gains no time. */
  const measure = (draft: FixDraft): Fix | null => {
    const rc = resolve(draft.changed);
    const parkedRun = run(rc, demand, { withDriving: false, untilCutoff: true, hours: coverHours });
    const routineRun = run(rc, demand, { withDriving: true, untilCutoff: true, hours: coverHours });
    const after = { parked: toDays(parkedRun.hoursToCutoff, coverHours), routine: toDays(routineRun.hoursToCutoff, coverHours) };
    const balance = repeatingWeek(rc, demand, false);
    const daysGainedParked = round((after.parked ?? coverDays) - (base.parked ?? coverDays), 2);
    const daysGainedRoutine = round((after.routine ?? coverDays) - (base.routine ?? coverDays), 2);
    if (daysGainedParked <= 0.01 && daysGainedRoutine <= 0.01) return null;
    const stops = draft.stops ? draft.stops(balance, routineRun.hoursToLvdOpen) : null;
    const cutsEssential = !!stops && stops.essentialLoads.length > 0;
    return {
      kind: draft.kind,
      daysGainedParked,
      daysGainedRoutine,
      outlastsHorizon: { parked: after.parked === null, routine: after.routine === null },
      ahPerDaySaved: round(baseUsed - usedPerDay(balance) + (balance.week.chargeAh / 7 - basePutBack), 2),
      summary: draft.summary,
      convenience: cutsEssential ? `${draft.convenience} It stops an essential load: ${listNames(stops!.essentialLoads)}.` : draft.convenience,
      change: draft.change,
      holds: balance.holds,
      stops,
      cutsEssential,
      figures: { ...draft.figures, daysGainedParked, daysGainedRoutine },
    };
  };

  const fixes: Fix[] = [];
  for (const candidate of FIX_CANDIDATES) {
    const draft = candidate(context);
    const fix = draft && measure(draft);
    if (fix) fixes.push(fix);
  }
  return fixes.sort((a, b) => b.daysGainedRoutine - a.daysGainedRoutine || b.daysGainedParked - a.daysGainedParked);
}
