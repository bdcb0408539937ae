import type { Projection } from '@/shared/energy/project';

const DAY_NAMES = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'];
export const DAY_SHORT = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

type Point = Projection['series'][number];

function when(p: Point) {
  return `${DAY_NAMES[p.weekday]} about ${String(p.hourOfDay).padStart(2, '0')}:00`;
}

/**
 * The chart in words, for screen readers and for anyone who cannot read the lines: when each line reaches
 * the cut-off ("reaches the cut-off on Tuesday about 06:00"), or that it stays above it.
 */
export function describeSoc(series: Point[], cutoffSocPercent: number): string {
  if (!series.length) return 'No projection to show.';
  const days = Math.round(series[series.length - 1].hour / 24);
  const cross = (key: 'socPercent' | 'parkedSocPercent') => series.find((p) => p[key] <= cutoffSocPercent + 1e-9);
  const routine = cross('socPercent');
  const parked = cross('parkedSocPercent');
  const part = (p: Point | undefined, label: string) =>
    p ? `${label} the charge reaches the cut-off (${cutoffSocPercent} %) on ${when(p)}` : `${label} the charge stays above the cut-off (${cutoffSocPercent} %) for all ${days} days`;
  const lowest = Math.min(...series.map((p) => p.socPercent));
  return `${part(routine, 'On your routine')}${routine ? '' : `, lowest ${Math.round(lowest)} %`}. ${part(parked, 'Parked, not driving,')}.`;
}

/** Hours (since the start) of each midnight, every `everyDays` days, with the weekday that begins there. */
export function dayTicks(series: Point[], everyDays: number): { hour: number; label: string }[] {
  const midnights = series.filter((p) => p.hourOfDay === 0);
  return midnights.filter((_, i) => i % everyDays === 0).map((p) => ({ hour: p.hour, label: DAY_SHORT[p.weekday] }));
}

/** The driving in the series as bands: start hour, end hour (each at least `minHours` wide). */
export function drivingBands(series: Point[], minHours: number): { from: number; to: number }[] {
  const bands: { from: number; to: number }[] = [];
  for (const p of series) {
    if (p.drivingMinutes <= 0) continue;
    const from = p.hour - 1;
    const to = from + p.drivingMinutes / 60;
    const last = bands[bands.length - 1];
    if (last && from <= last.to + 1e-9) last.to = Math.max(last.to, to);
    else bands.push({ from, to });
  }
  return bands.map((b) => (b.to - b.from < minHours ? { from: b.from - (minHours - (b.to - b.from)) / 2, to: b.to + (minHours - (b.to - b.from)) / 2 } : b));
}

/** Points of a line with its flat stretch left out: each value at or below `floor` after the first is dropped. */
export function stopWhenFlat(values: number[], floor = 0.5): (number | undefined)[] {
  return values.map((v, i) => (v <= floor && i > 0 && values[i - 1] <= floor ? undefined : v));
}

type TripPoint = { hour: number; at: string; socPercent: number; stay: number };
const weekdayOf = (at: string) => DAY_NAMES[(new Date(`${at.slice(0, 10)}T12:00:00Z`).getUTCDay() + 6) % 7];

/**
 * A trip's chart in one line: where and when the charge first reaches the cut-off, or else its lowest point
 * ("lowest 42 % at the Lake on Tuesday, above the cut-off (25 %) all trip").
 */
export function describeTripSoc(series: TripPoint[], stayNames: string[], cutoffSocPercent: number): string {
  if (!series.length) return 'No trip to show.';
  const place = (p: TripPoint) => `at ${stayNames[p.stay] ?? 'the first stay'} on ${weekdayOf(p.at)} about ${p.at.slice(11, 16)}`;
  const cross = series.find((p) => p.socPercent <= cutoffSocPercent + 1e-9);
  if (cross) return `Reaches the cut-off (${cutoffSocPercent} %) ${place(cross)}.`;
  const lowest = series.reduce((m, p) => (p.socPercent < m.socPercent ? p : m));
  return `Lowest ${Math.round(lowest.socPercent)} % ${place(lowest)}, above the cut-off (${cutoffSocPercent} %) all trip.`;
}

/** Hours of the trip's midnights, every `everyDays` days, with the weekday that begins there. */
export function tripDayTicks(series: TripPoint[], everyDays: number): { hour: number; label: string }[] {
  return series
    .filter((p) => p.at.endsWith('T00:00'))
    .filter((_, i) => i % everyDays === 0)
    .map((p) => ({ hour: p.hour, label: weekdayOf(p.at).slice(0, 3) }));
}

/** The hour (from the trip's start) a stamp "YYYY-MM-DDTHH:00" falls at, or null if outside the series. */
export function tripHourAt(series: TripPoint[], at: string): number | null {
  if (!series.length) return null;
  const first = series[0];
  const h = first.hour + (Date.parse(`${at}:00Z`) - Date.parse(`${first.at}:00Z`)) / 3_600_000;
  return Number.isFinite(h) ? h : null;
}
