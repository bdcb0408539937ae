import type { ProjectionInput } from '../schemas/projection';
import type { Trip } from '../schemas/trip';
import { calendarHours } from './calendar';
import { buildDemandProfile, zeros } from './profile';
import { type Fix, type MarginState, project, type Warning } from './project';
import { resolve } from './resolve';
import { run } from './run';
import { addDays } from './solar';

/** Defaults of a trip's model, each a model choice or from memory (docs/model.md). */
export const TRIP_DEFAULTS = {
  /** A battery in the cabin sits this much above the day's mean outside (from memory: lived-in vans run 5 to 10 °C warmer). */
  cabinWarmerByC: 8,
  /** Shore charging current at a stay with shore power when the rig names none (model choice: a small 10 A charger). */
  shoreA: 10,
  /** Days past a stay's nights that its "days to cut-off" looks (model choice), within the 60-day cap. */
  lookBeyondStayDays: 7,
} as const;

export type StayOutlook = {
  leg: number;
  name: string;
  arriveAt: string;
  leaveAt: string;
  nights: number;
  batteryTemperatureC: number;
  temperatureFactor: number;
  shore: boolean;
  sunAhPerDay: number;
  socOnArrivalPercent: number;
  socOnLeavingPercent: number;
  lowestSocPercent: number;
  /** Days from arrival to the cut-off parked at this place, or null when it lasts past the look-ahead. */
  daysToCutoff: number | null;
  marginDays: number | null;
  marginState: MarginState;
  /** Arrived at or below the cut-off (an earlier leg ran it down): Tight if the stay lifts it back, else Short. */
  arrivesBelowCutoff: boolean;
};

export type TripOutlook = {
  startDate: string;
  stays: StayOutlook[];
  drives: { leg: number; date: string; startHour: number; minutes: number }[];
  /** Hour by hour from the trip's first hour: the state of charge and the stay it belongs to. */
  series: { hour: number; at: string; socPercent: number; stay: number }[];
  endSocPercent: number;
  cutoffSocPercent: number;
  marginState: MarginState;
  /** The stay with the least margin: the Fixes are worked for it. */
  tightestStay: string;
  warnings: Warning[];
  fixes: Fix[];
};

const round = (x: number, d = 2) => Math.round(x * 10 ** d) / 10 ** d;
const stamp = (date: string, hourFromMidnight: number) => `${addDays(date, Math.floor(hourFromMidnight / 24))}T${String(hourFromMidnight % 24).padStart(2, '0')}:00`;
const dayNumber = (iso: string) => Date.parse(`${iso}T00:00:00Z`) / 86_400_000;
const STATE_RANK: Record<MarginState, number> = { comfortable: 0, tight: 1, short: 2 };

/**
 * Where each leg falls, in hours from the trip's first hour: stays one after another from the start date's
 * arrival hour, each `nights` × 24 hours long; drives at their own date and hour (a drive inside a stay's
 * hours is an errand, one on the day two stays meet is the move between them). The run starts at the
 * earlier of the first arrival and any drive on the start date.
 */
export function tripTimeline(trip: Trip) {
  const firstDriveHour = Math.min(...trip.legs.map((l) => (l.kind === 'drive' && l.date === trip.startDate ? l.startHour : 24)));
  const startHour = Math.min(trip.arrivalHour, firstDriveHour);
  let at = trip.arrivalHour - startHour;
  const stays: { leg: number; from: number; to: number }[] = [];
  const drives: { leg: number; from: number; minutes: number }[] = [];
  trip.legs.forEach((leg, i) => {
    if (leg.kind === 'stay') {
      stays.push({ leg: i, from: at, to: at + leg.nights * 24 });
      at += leg.nights * 24;
    } else {
      drives.push({ leg: i, from: (dayNumber(leg.date) - dayNumber(trip.startDate)) * 24 + leg.startHour - startHour, minutes: leg.minutes });
    }
  });
  return { startHour, hours: at, stays, drives };
}

/** The battery's temperature at a stay: the day's mean outside, warmer inside the cabin. */
export const stayBatteryTemperature = (leg: { lowC: number; highC: number }, inCabin: boolean) =>
  (leg.lowC + leg.highC) / 2 + (inCabin ? TRIP_DEFAULTS.cabinWarmerByC : 0);

/**
 * A rig over a dated trip. The run goes stay by stay: each stay is the rig parked at that place (its sun by
 * date from FAO-56, its temperature, its shore power), with the trip's drives wherever they fall; the state of
 * charge carries from one stay into the next. Each stay's margin is the rig parked there from its arrival.
 */
export function projectTrip(input: ProjectionInput, trip: Trip, options: { fixes?: boolean } = {}): TripOutlook {
  const tl = tripTimeline(trip);
  const rigShoreA = input.charging.shore && input.charging.shore.amps > 0 ? input.charging.shore.amps : TRIP_DEFAULTS.shoreA;
  const driving = zeros(tl.hours + 1);
  for (const d of tl.drives) {
    for (let t = d.from, left = d.minutes / 60; left > 1e-12 && t < tl.hours; t++, left -= 1) {
      if (t >= 0) driving[t] = Math.min(1, driving[t] + Math.min(1, left));
    }
  }
  const demand = buildDemandProfile(
    input.loads.filter((l) => l.status === 'installed'),
    input.systemVoltage,
    input.inverter ? input.inverter.efficiencyPercent / 100 : 1,
  );

  const stayInput = (k: number, fromHour: number, startSoc: number, horizonDays: number): ProjectionInput => {
    const leg = trip.legs[tl.stays[k].leg];
    if (leg.kind !== 'stay') throw new Error('not a stay');
    const abs = tl.startHour + fromHour;
    return {
      ...input,
      battery: { ...input.battery, temperatureC: stayBatteryTemperature(leg, trip.batteryInCabin), temperatureFactor: undefined, startSocPercent: startSoc },
      charging: {
        ...input.charging,
        drivingMinutesPerDay: [0, 0, 0, 0, 0, 0, 0],
        peakSunHours: 0,
        shore: leg.shore ? { amps: rigShoreA, hoursPerDay: 24, startHour: 0, weekdays: [0, 1, 2, 3, 4, 5, 6] } : undefined,
      },
      location: { latitudeDeg: leg.latitudeDeg, elevationM: leg.elevationM, sky: leg.sky },
      start: { weekday: 0, hour: abs % 24, date: addDays(trip.startDate, Math.floor(abs / 24)) },
      horizonDays,
      plannedStayDays: leg.nights,
    };
  };

  const series: TripOutlook['series'] = [];
  const stays: StayOutlook[] = [];
  const warnings = new Map<string, Warning>();
  let soc = input.battery.startSocPercent;
  let cutoff = 0;
  let tightest = 0;
  let tightestInput: ProjectionInput | null = null;
  const marginKey = (s: StayOutlook) => STATE_RANK[s.marginState] * 1e6 - (s.marginDays ?? 1e5);
  tl.stays.forEach((seg, k) => {
    const leg = trip.legs[seg.leg];
    if (leg.kind !== 'stay') return;
    // The first stay's conditions also cover a drive before the first arrival.
    const from = k === 0 ? 0 : seg.from;
    const hours = seg.to - from;
    const r = resolve(stayInput(k, from, soc, Math.ceil(hours / 24)));
    const drivingHere = zeros(calendarHours(r.horizonHours));
    for (let t = 0; t < hours; t++) drivingHere[t] = driving[from + t];
    r.drivingByHour = drivingHere;
    const trace = run(r, demand, { withDriving: true, record: true, hours }).trace!;
    let arrival = soc;
    let lowest = Infinity;
    for (let t = 0; t < hours; t++) {
      const p = (trace.ah[t] / r.usableAh) * 100;
      if (from + t + 1 === seg.from) arrival = p;
      if (from + t >= seg.from && p < lowest) lowest = p;
      series.push({ hour: from + t + 1, at: stamp(trip.startDate, tl.startHour + from + t + 1), socPercent: round(p), stay: k });
    }
    lowest = Math.min(lowest, arrival);
    soc = (trace.ah[hours - 1] / r.usableAh) * 100;
    cutoff = r.cutoffSoc;
    const horizonDays = Math.min(60, leg.nights + TRIP_DEFAULTS.lookBeyondStayDays);
    const there = stayInput(k, seg.from, Math.min(100, Math.max(0, arrival)), horizonDays);
    const p = project(there, { fixes: false });
    for (const w of p.warnings) if (w.code !== 'stay-beyond-horizon') warnings.set(w.code, w);
    let sunAh = 0;
    for (const x of p.solar.dailyAh.slice(0, leg.nights)) sunAh += x;
    const below = arrival <= r.cutoffSoc + 1e-9;
    const stay: StayOutlook = {
      leg: seg.leg,
      name: leg.name,
      arriveAt: stamp(trip.startDate, tl.startHour + seg.from),
      leaveAt: stamp(trip.startDate, tl.startHour + seg.to),
      nights: leg.nights,
      batteryTemperatureC: round(stayBatteryTemperature(leg, trip.batteryInCabin), 1),
      temperatureFactor: round(r.temperatureFactor, 3),
      shore: leg.shore,
      sunAhPerDay: round(sunAh / leg.nights, 1),
      socOnArrivalPercent: round(arrival, 1),
      socOnLeavingPercent: round(soc, 1),
      lowestSocPercent: round(lowest, 1),
      daysToCutoff: below ? 0 : p.routine.daysToCutoff,
      marginDays: below ? null : p.margin.days,
      marginState: below ? (soc > r.cutoffSoc ? 'tight' : 'short') : p.margin.state,
      arrivesBelowCutoff: below,
    };
    stays.push(stay);
    if (!tightestInput || marginKey(stay) > marginKey(stays[tightest])) {
      tightest = stays.length - 1;
      tightestInput = there;
    }
  });
  const fixes = options.fixes === false || !tightestInput || stays[tightest].marginState === 'comfortable' ? [] : project(tightestInput).fixes;
  return {
    startDate: trip.startDate,
    stays,
    drives: tl.drives.map((d) => {
      const leg = trip.legs[d.leg] as Extract<Trip['legs'][number], { kind: 'drive' }>;
      return { leg: d.leg, date: leg.date, startHour: leg.startHour, minutes: leg.minutes };
    }),
    series,
    endSocPercent: round(soc, 1),
    cutoffSocPercent: cutoff,
    marginState: stays.reduce<MarginState>((w, s) => (STATE_RANK[s.marginState] > STATE_RANK[w] ? s.marginState : w), 'comfortable'),
    tightestStay: stays[tightest]?.name ?? '',
    warnings: [...warnings.values()],
    fixes,
  };
}
