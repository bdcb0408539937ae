import type { ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import type { DemandProfile } from './profile';
import { type Balance, repeatingWeek, routineHolds } from './repeating-week';
import { resolve, type Resolved } from './resolve';
import { round, run } from './simulate';

export type FixKind = 'cutoff-switch' | 'ignition-relay' | 'low-voltage-disconnect' | 'more-driving' | 'more-battery' | 'house-battery' | 'solar';

/** The AC loads a Fix stops while parked: which, when, and the amp-hours a day they would have used. */
export type FixStops = {
  loads: string[];
  /** Of those, the ones marked essential. */
  essentialLoads: string[];
  /** 'parked' (whenever the vehicle is parked) or 'low-battery' (once the disconnect opens). */
  when: 'parked' | 'low-battery';
  /** Days from the start until they first stop on the routine; null when not within the run. */
  fromDay: number | null;
  ahPerDayNotServed: number;
};

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

export const toDays = (hours: number | null, limitHours: number) => (hours === null || hours > limitHours + 1e-9 ? null : round(hours / 24, 2));

export function listNames(names: string[]) {
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

/** A Fix's gain in words: "outlasts the horizon" where it reaches the end of the run, else the days. */
export function fixGainText(fix: Pick<Fix, 'daysGainedRoutine' | 'daysGainedParked' | 'outlastsHorizon' | 'holds'>): string {
  const routine = fix.holds ? 'the routine holds' : fix.outlastsHorizon.routine ? 'outlasts the horizon on your routine' : `+${fix.daysGainedRoutine.toFixed(1)} days on your routine`;
  const parked = fix.outlastsHorizon.parked ? 'outlasts the horizon parked' : fix.daysGainedParked > 0 ? `+${fix.daysGainedParked.toFixed(1)} days parked` : '';
  return parked ? `${routine}, ${parked}` : routine;
}

type Base = { parked: number | null; routine: number | null; balance: Balance };
type Runs = { horizonHours: number; coverHours: number };

export function findFixes(input: ProjectionInput, r: Resolved, demand: DemandProfile, base: Base, runs: Runs): Fix[] {
  const { coverHours } = runs;
  const coverDays = coverHours / 24;
  const fixes: Fix[] = [];
  const daysOf = (rc: Resolved) => {
    const p = run(rc, demand, { withDriving: false, untilCutoff: true, hours: coverHours });
    const q = run(rc, demand, { withDriving: true, untilCutoff: true, hours: coverHours });
    return { parked: toDays(p.hoursToCutoff, coverHours), routine: toDays(q.hoursToCutoff, coverHours), lvdOpenHours: q.hoursToLvdOpen };
  };
  const perWeek = (b: Balance) => (b.week.loadAh + b.week.inverterIdleAh + b.week.keyOffAh + b.week.selfDischargeAh) / 7;
  const baseUsed = perWeek(base.balance);
  const basePutBack = base.balance.week.chargeAh / 7;
  const essentialNames = new Set(demand.loads.filter((lp) => lp.load.essential).map((lp) => lp.load.name));

  type Draft = Pick<Fix, 'kind' | 'summary' | 'convenience' | 'change' | 'figures'> & { stops?: (b: Balance, lvdOpenHours: number | null) => FixStops | null };
  const push = (draft: Draft, changed: ProjectionInput) => {
    const rc = resolve(changed);
    const after = daysOf(rc);
    const balance = repeatingWeek(rc, demand, false);
    const daysGainedParked = round((after.parked ?? coverDays) - (base.parked ?? coverDays), 2);
    const daysGainedRoutine = round((after.routine ?? coverDays) - (base.routine ?? coverDays), 2);
    if (daysGainedParked <= 0.01 && daysGainedRoutine <= 0.01) return;
    const stops = draft.stops ? draft.stops(balance, after.lvdOpenHours) : null;
    const used = perWeek(balance);
    const putBack = balance.week.chargeAh / 7;
    const cutsEssential = !!stops && stops.essentialLoads.length > 0;
    fixes.push({
      kind: draft.kind,
      daysGainedParked,
      daysGainedRoutine,
      outlastsHorizon: { parked: after.parked === null, routine: after.routine === null },
      ahPerDaySaved: round(baseUsed - used + (putBack - basePutBack), 2),
      summary: draft.summary,
      convenience: cutsEssential ? `${draft.convenience} It stops an essential load: ${listNames(stops!.essentialLoads)}.` : draft.convenience,
      change: draft.change,
      holds: balance.holds,
      stops,
      cutsEssential,
      figures: { ...draft.figures, daysGainedParked, daysGainedRoutine },
    });
  };
  const withControl = (control: NonNullable<ProjectionInput['inverter']>['control']): ProjectionInput => ({
    ...input,
    inverter: input.inverter ? { ...input.inverter, control } : null,
  });
  const acLoads = demand.loads.filter((lp) => lp.ac);
  const acNames = acLoads.map((lp) => lp.load.name);
  const acParkedNames = acLoads.filter((lp) => lp.runsParked).map((lp) => lp.load.name);
  const stopsOf = (names: string[], when: FixStops['when'], fromDay: number | null, b: Balance): FixStops | null => {
    const ahPerDayNotServed = round(b.week.acNotServedAh / 7, 2);
    if (!names.length || (when === 'low-battery' && fromDay === null && ahPerDayNotServed === 0)) return null;
    return { loads: names, essentialLoads: names.filter((n) => essentialNames.has(n)), when, fromDay, ahPerDayNotServed };
  };

  if (input.inverter && input.inverter.control !== 'manual-switch') {
    push(
      {
        kind: 'cutoff-switch',
        summary: `Fit a manual cut-off switch on the inverter feed and switch it on only when an AC load runs: no more ${input.inverter.idleA} A idle draw the rest of the time.`,
        convenience: acNames.length ? `You switch the inverter on before using ${listNames(acNames)}.` : 'You switch the inverter on when you need it.',
        change: { inverter: { control: 'manual-switch' } },
        figures: { idleA: input.inverter.idleA },
      },
      withControl('manual-switch'),
    );
  }
  if (input.inverter && input.inverter.control !== 'ignition-relay') {
    push(
      {
        kind: 'ignition-relay',
        summary: 'Feed the inverter through an ignition-keyed relay so it is live only while the vehicle runs.',
        convenience: acParkedNames.length ? `${listNames(acParkedNames)} would no longer run while parked.` : 'Nothing you use while parked is cut.',
        change: { inverter: { control: 'ignition-relay' } },
        figures: {},
        stops: (b) => stopsOf(acParkedNames, 'parked', acParkedNames.length ? 0 : null, b),
      },
      withControl('ignition-relay'),
    );
  }
  if (input.inverter && input.inverter.control !== 'low-voltage-disconnect') {
    const changed = withControl('low-voltage-disconnect');
    const lvdSoc = resolve(changed).inverter!.lvdSoc;
    push(
      {
        kind: 'low-voltage-disconnect',
        summary: `Put a low-voltage disconnect on the inverter: it switches off at ${lvdSoc} % and leaves the rest for the DC loads.`,
        convenience: acNames.length ? `${listNames(acNames)} stop when the battery falls to ${lvdSoc} %, until it is charged again.` : 'Nothing you use is cut.',
        change: { inverter: { control: 'low-voltage-disconnect', lvdSocPercent: lvdSoc } },
        figures: { lvdSocPercent: lvdSoc },
        stops: (b, openHours) => stopsOf(acNames, 'low-battery', openHours === null ? null : round(openHours / 24, 2), b),
      },
      changed,
    );
  }

  const holdsWith = (changed: ProjectionInput) => routineHolds(resolve(changed), demand);
  if (!base.balance.holds && r.alternatorA > 0) {
    const withMinutes = (m: number): ProjectionInput => ({
      ...input,
      charging: { ...input.charging, drivingMinutesPerDay: input.charging.drivingMinutesPerDay.map((x) => Math.max(x, m)) },
    });
    const minutes = searchMin(0, 480, 5, (m) => holdsWith(withMinutes(m)));
    if (minutes !== null && minutes > 0) {
      const changed = withMinutes(minutes);
      push(
        {
          kind: 'more-driving',
          summary: `Drive at least ${minutes} minutes every day: the alternator then puts back what the week uses.`,
          convenience: `${minutes} minutes behind the wheel each day, parked or not.`,
          change: { charging: { drivingMinutesPerDay: changed.charging.drivingMinutesPerDay } },
          figures: { minutes },
        },
        changed,
      );
    }
  }

  if (input.plannedStayDays > 0 && base.routine !== null && base.routine < input.plannedStayDays) {
    const starter = input.battery.role === 'starter';
    const withCapacity = (ah: number): ProjectionInput => ({
      ...input,
      battery: starter ? { ...input.battery, capacityAh: ah, role: 'house', cutoffSocPercent: undefined } : { ...input.battery, capacityAh: ah },
    });
    const reach = (ah: number) => {
      const d = toDays(run(resolve(withCapacity(ah)), demand, { withDriving: true, untilCutoff: true, hours: coverHours }).hoursToCutoff, coverHours);
      return d === null || d >= input.plannedStayDays;
    };
    const lo = starter ? 10 : input.battery.capacityAh;
    const needed = searchMin(lo, Math.min(20_000, Math.max(input.battery.capacityAh, 100) * 20), 10, reach);
    if (needed !== null && (starter || needed > input.battery.capacityAh)) {
      const changed = withCapacity(needed);
      push(
        starter
          ? {
              kind: 'house-battery',
              summary: `Fit a separate house battery of about ${needed} Ah with split charging (a DC-DC charger or a voltage-sensitive relay) for the loads, and keep the starting battery for the engine: it covers the planned ${input.plannedStayDays}-day stay.`,
              convenience: 'Cost, weight and space for a second battery and its charger; the engine always starts.',
              change: { battery: { capacityAh: needed, role: 'house', cutoffSocPercent: undefined } },
              figures: { capacityAh: needed, plannedStayDays: input.plannedStayDays },
            }
          : {
              kind: 'more-battery',
              summary: `A battery bank of about ${needed} Ah (${needed - input.battery.capacityAh} Ah more) covers the planned ${input.plannedStayDays}-day stay.`,
              convenience: 'Cost, weight and space for the extra battery, and a charging source to refill it.',
              change: { battery: { capacityAh: needed } },
              figures: { capacityAh: needed, moreAh: needed - input.battery.capacityAh, plannedStayDays: input.plannedStayDays },
            },
        changed,
      );
    }
  }

  if (!base.balance.holds) {
    // With a place and dates, the panels get that place's sun (peak sun hours left at 0), not a fixed figure.
    const bySun = r.solarByHour !== null;
    const psh = bySun ? 0 : input.charging.peakSunHours > 0 ? input.charging.peakSunHours : MODEL_DEFAULTS.fixPeakSunHours;
    const withSolar = (w: number): ProjectionInput => ({ ...input, charging: { ...input.charging, solarW: w, peakSunHours: psh } });
    const watts = searchMin(input.charging.solarW, 3000, 10, (w) => holdsWith(withSolar(w)));
    if (watts !== null && watts > input.charging.solarW) {
      push(
        {
          kind: 'solar',
          summary: `About ${watts} W of solar${input.charging.solarW ? ` (${watts - input.charging.solarW} W more)` : ''} ${bySun ? 'in the sun of this place and season' : `at ${psh} peak sun hours`} balances the week.`,
          convenience: 'Roof space and a charge controller; less in cloud and in winter.',
          change: { charging: { solarW: watts, peakSunHours: psh } },
          figures: { solarW: watts, moreW: watts - input.charging.solarW, peakSunHours: psh },
        },
        withSolar(watts),
      );
    }
  }

  return fixes.sort((a, b) => b.daysGainedRoutine - a.daysGainedRoutine || b.daysGainedParked - a.daysGainedParked);
}
