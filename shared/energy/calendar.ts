import type { ProjectionInput } from '../schemas/projection';
import { MODEL_DEFAULTS } from './defaults';
import { HOURS_PER_WEEK, zeros } from './profile';
import { addDays, dailySun, type Sky, solarAmpsForDay } from './solar';

/**
 * Inputs that follow the calendar instead of the weekly pattern: per hour of a run from its start (index 0
 * is the start hour), long enough for any run of the horizon (and at least a week, for the weekly totals).
 * A null array means the weekly pattern applies.
 */
export type CalendarInputs = {
  solarByHour: number[] | null;
  shoreByHour: number[] | null;
  drivingByHour: number[] | null;
};

export const NO_CALENDAR: CalendarInputs = { solarByHour: null, shoreByHour: null, drivingByHour: null };

/** Hours a calendar array covers for a horizon: the longest run the model makes of it (a stay is covered up to maxRunDays). */
export const calendarHours = (horizonHours: number) => Math.max(horizonHours, HOURS_PER_WEEK, MODEL_DEFAULTS.maxRunDays * 24);

/**
 * The sun of each day at the place, when the input names a start date and a location and no peak sun
 * hours of its own (a positive peakSunHours keeps today's fixed figure).
 */
export function calendarOf(input: ProjectionInput, derate: number): CalendarInputs {
  const ch = input.charging;
  if (!input.start.date || !input.location || ch.peakSunHours > 0) return NO_CALENDAR;
  return {
    ...NO_CALENDAR,
    solarByHour: solarByHourFrom(input.start.date, input.start.hour, calendarHours(input.horizonDays * 24), ch.solarW, derate, input.systemVoltage, {
      latitudeDeg: input.location.latitudeDeg,
      elevationM: input.location.elevationM,
      sky: input.location.sky,
    }),
  };
}

/** Solar current per hour of a run that starts at `hour` on `date`, each day's sun from FAO-56 (solar.ts). */
export function solarByHourFrom(
  date: string,
  hour: number,
  hours: number,
  watts: number,
  derate: number,
  systemVoltage: number,
  place: { latitudeDeg: number; elevationM?: number; sky?: Sky },
): number[] {
  const out = zeros(hours);
  if (watts <= 0) return out;
  for (let day = 0, t = -hour; t < hours; day++, t += 24) {
    const amps = solarAmpsForDay(dailySun({ ...place, date: addDays(date, day) }), watts, derate, systemVoltage);
    for (let h = 0; h < 24; h++) if (t + h >= 0 && t + h < hours) out[t + h] = amps[h];
  }
  return out;
}

/** The solar amp-hours of each calendar day of the horizon (the first and last days may be part days). */
export function solarDailyAh(solarByHour: number[], startHour: number, horizonHours: number): number[] {
  const days: number[] = [];
  for (let t = 0; t < horizonHours; t++) {
    const d = Math.floor((startHour + t) / 24);
    days[d] = (days[d] ?? 0) + solarByHour[t];
  }
  return days.map((x) => Math.round(x * 100) / 100);
}

/** What the projection reports of its sun: amp-hours of each calendar day it used, and where they came from. */
export function solarReport(r: {
  solarByHour: number[] | null;
  solarByHourOfDay: number[];
  horizonHours: number;
  startHourOfWeek: number;
}): { source: 'place-and-date' | 'peak-sun-hours'; dailyAh: number[] } {
  const startHour = r.startHourOfWeek % 24;
  if (r.solarByHour !== null) return { source: 'place-and-date', dailyAh: solarDailyAh(r.solarByHour, startHour, r.horizonHours) };
  let any = false;
  for (let h = 0; h < 24; h++) if (r.solarByHourOfDay[h] !== 0) any = true;
  // No panels: zeros without walking the horizon (every projection reports this).
  if (!any) return { source: 'peak-sun-hours', dailyAh: zeros(Math.ceil((startHour + r.horizonHours) / 24)) };
  const pattern = zeros(r.horizonHours);
  for (let t = 0; t < r.horizonHours; t++) pattern[t] = r.solarByHourOfDay[(startHour + t) % 24];
  return { source: 'peak-sun-hours', dailyAh: solarDailyAh(pattern, startHour, r.horizonHours) };
}
