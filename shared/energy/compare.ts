import type { CompareInput, ProjectionInput } from '../schemas/projection';
import type { MarginState } from './margin';
import { installedLoads, type Projection, project } from './project';
import { round } from './round';
import type { Warning } from './warnings';

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
