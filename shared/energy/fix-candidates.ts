import type { InverterControl, ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import type { DemandProfile } from './profile';
import { type Balance, routineHolds } from './repeating-week';
import { resolve, type Resolved } from './resolve';
import { round, toDays } from './round';
import { run } from './run';
import { listNames } from './words';

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

/** The rig as it is, for the candidates to work from. */
export type FixContext = {
  input: ProjectionInput;
  r: Resolved;
  demand: DemandProfile;
  /** Days to the cut-off parked and on the routine (null: not within the run), and the repeating week. */
  base: { parked: number | null; routine: number | null; balance: Balance };
  coverHours: number;
  /** The AC loads, all of them and those that run while parked. */
  acNames: string[];
  acParkedNames: string[];
  /** The loads marked essential. */
  essentialNames: Set<string>;
};

/** A candidate worked out for the rig: its texts, the change it makes, and the rig with that change. */
export type FixDraft = {
  kind: FixKind;
  summary: string;
  convenience: string;
  change: Record<string, unknown>;
  figures: Record<string, number | string | null>;
  /** The AC loads the Fix stops, from its repeating week and when its disconnect first opens. */
  stops?: (b: Balance, lvdOpenHours: number | null) => FixStops | null;
  changed: ProjectionInput;
};

/** One candidate Fix: its draft for the rig, or null where it does not apply or no size of it helps. */
export type FixCandidate = (c: FixContext) => FixDraft | null;

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

function stopsOf(c: FixContext, names: string[], when: FixStops['when'], fromDay: number | null, b: Balance): FixStops | null {
  const ahPerDayNotServed = round(b.week.acNotServedAh / 7, 2);
  if (!names.length || (when === 'low-battery' && fromDay === null && ahPerDayNotServed === 0)) return null;
  return { loads: names, essentialLoads: names.filter((n) => c.essentialNames.has(n)), when, fromDay, ahPerDayNotServed };
}

const withControl = (input: ProjectionInput, control: InverterControl): ProjectionInput => ({
  ...input,
  inverter: input.inverter ? { ...input.inverter, control } : null,
});

const holdsWith = (c: FixContext, changed: ProjectionInput) => routineHolds(resolve(changed), c.demand);

const cutoffSwitch: FixCandidate = ({ input, acNames }) => {
  if (!input.inverter || input.inverter.control === 'manual-switch') return null;
  return {
    kind: 'cutoff-switch',
    summary: `Fit a manual cut-off switch on the inverter feed and switch it on only when an AC load runs: no more ${input.inverter.idleA} A idle draw the rest of the time.`,
    convenience: acNames.length ? `You switch the inverter on before using ${listNames(acNames)}.` : 'You switch the inverter on when you need it.',
    change: { inverter: { control: 'manual-switch' } },
    figures: { idleA: input.inverter.idleA },
    changed: withControl(input, 'manual-switch'),
  };
};

const ignitionRelay: FixCandidate = (c) => {
  const { input, acParkedNames } = c;
  if (!input.inverter || input.inverter.control === 'ignition-relay') return null;
  return {
    kind: 'ignition-relay',
    summary: 'Feed the inverter through an ignition-keyed relay so it is live only while the vehicle runs.',
    convenience: acParkedNames.length ? `${listNames(acParkedNames)} would no longer run while parked.` : 'Nothing you use while parked is cut.',
    change: { inverter: { control: 'ignition-relay' } },
    figures: {},
    stops: (b) => stopsOf(c, acParkedNames, 'parked', acParkedNames.length ? 0 : null, b),
    changed: withControl(input, 'ignition-relay'),
  };
};

const lowVoltageDisconnect: FixCandidate = (c) => {
  const { input, acNames } = c;
  if (!input.inverter || input.inverter.control === 'low-voltage-disconnect') return null;
  const changed = withControl(input, 'low-voltage-disconnect');
  const lvdSoc = resolve(changed).inverter!.lvdSoc;
  return {
    kind: 'low-voltage-disconnect',
    summary: `Put a low-voltage disconnect on the inverter: it switches off at ${lvdSoc} % and leaves the rest for the DC loads.`,
    convenience: acNames.length ? `${listNames(acNames)} stop when the battery falls to ${lvdSoc} %, until it is charged again.` : 'Nothing you use is cut.',
    change: { inverter: { control: 'low-voltage-disconnect', lvdSocPercent: lvdSoc } },
    figures: { lvdSocPercent: lvdSoc },
    stops: (b, openHours) => stopsOf(c, acNames, 'low-battery', openHours === null ? null : round(openHours / 24, 2), b),
    changed,
  };
};

const moreDriving: FixCandidate = (c) => {
  const { input } = c;
  if (c.base.balance.holds || c.r.alternatorA <= 0) return null;
  const withMinutes = (m: number): ProjectionInput => ({
    ...input,
    charging: { ...input.charging, drivingMinutesPerDay: input.charging.drivingMinutesPerDay.map((x) => Math.max(x, m)) },
  });
  const minutes = searchMin(0, 480, 5, (m) => holdsWith(c, withMinutes(m)));
  if (minutes === null || minutes <= 0) return null;
  const changed = withMinutes(minutes);
  return {
    kind: 'more-driving',
    summary: `Drive at least ${minutes} minutes every day: the alternator then puts back what the week uses.`,
    convenience: `${minutes} minutes behind the wheel each day, parked or not.`,
    change: { charging: { drivingMinutesPerDay: changed.charging.drivingMinutesPerDay } },
    figures: { minutes },
    changed,
  };
};

/** A bigger bank covers the stay; on a starting battery, a separate house battery instead. */
const moreBattery: FixCandidate = (c) => {
  const { input, coverHours } = c;
  const stay = input.plannedStayDays;
  if (!(stay > 0 && c.base.routine !== null && c.base.routine < stay)) return null;
  const starter = input.battery.role === 'starter';
  const withCapacity = (ah: number): ProjectionInput => ({
    ...input,
    battery: starter ? { ...input.battery, capacityAh: ah, role: 'house', cutoffSocPercent: undefined } : { ...input.battery, capacityAh: ah },
  });
  const reach = (ah: number) => {
    const d = toDays(run(resolve(withCapacity(ah)), c.demand, { withDriving: true, untilCutoff: true, hours: coverHours }).hoursToCutoff, coverHours);
    return d === null || d >= stay;
  };
  const lo = starter ? 10 : input.battery.capacityAh;
  const needed = searchMin(lo, Math.min(20_000, Math.max(input.battery.capacityAh, 100) * 20), 10, reach);
  if (needed === null || !(starter || needed > input.battery.capacityAh)) return null;
  const changed = withCapacity(needed);
  const draft: FixDraft = starter
    ? {
        kind: 'house-battery',
        summary: `Fit a separate house battery of about ${needed} Ah with split charging (a DC-DC charger or a voltage-sensitive relay) for the loads, and keep the starting battery for the engine: it covers the planned ${stay}-day stay.`,
        convenience: 'Cost, weight and space for a second battery and its charger; the engine always starts.',
        change: { battery: { capacityAh: needed, role: 'house', cutoffSocPercent: undefined } },
        figures: { capacityAh: needed, plannedStayDays: stay },
        changed,
      }
    : {
        kind: 'more-battery',
        summary: `A battery bank of about ${needed} Ah (${needed - input.battery.capacityAh} Ah more) covers the planned ${stay}-day stay.`,
        convenience: 'Cost, weight and space for the extra battery, and a charging source to refill it.',
        change: { battery: { capacityAh: needed } },
        figures: { capacityAh: needed, moreAh: needed - input.battery.capacityAh, plannedStayDays: stay },
        changed,
      };
  return draft;
};

const solar: FixCandidate = (c) => {
  const { input } = c;
  if (c.base.balance.holds) return null;
  // With a place and dates, the panels get that place's sun (peak sun hours left at 0), not a fixed figure.
  const bySun = c.r.solarByHour !== null;
  const psh = bySun ? 0 : input.charging.peakSunHours > 0 ? input.charging.peakSunHours : MODEL_DEFAULTS.fixPeakSunHours;
  const withSolar = (w: number): ProjectionInput => ({ ...input, charging: { ...input.charging, solarW: w, peakSunHours: psh } });
  const watts = searchMin(input.charging.solarW, 3000, 10, (w) => holdsWith(c, withSolar(w)));
  if (watts === null || watts <= input.charging.solarW) return null;
  return {
    kind: 'solar',
    summary: `About ${watts} W of solar${input.charging.solarW ? ` (${watts - input.charging.solarW} W more)` : ''} ${bySun ? 'in the sun of this place and season' : `at ${psh} peak sun hours`} balances the week.`,
    convenience: 'Roof space and a charge controller; less in cloud and in winter.',
    change: { charging: { solarW: watts, peakSunHours: psh } },
    figures: { solarW: watts, moreW: watts - input.charging.solarW, peakSunHours: psh },
    changed: withSolar(watts),
  };
};

/**
 * Every candidate Fix, in the order they are tried (equal gains keep this order): the three ways to switch
 * the inverter, then more driving, a bigger bank (or a house battery) and solar.
 */
export const FIX_CANDIDATES: readonly FixCandidate[] = [cutoffSwitch, ignitionRelay, lowVoltageDisconnect, moreDriving, moreBattery, solar];
