import type { RigPower } from './schemas/projection';

// Named starting points for the week's driving. New rig offers them; the user adjusts the minutes and the
// Outlook names the routine it used (or "your own routine" once the minutes no longer match one).

export type RoutineKey = 'not-driving' | 'mostly-parked' | 'short-drive' | 'on-the-move';

export type RoutinePreset = {
  key: RoutineKey;
  name: string;
  /** What it means, in a few words. */
  summary: string;
  /** Minutes of driving per weekday, Monday first. */
  minutes: readonly number[];
  startHour: number;
};

export const ROUTINE_PRESETS: readonly RoutinePreset[] = [
  { key: 'not-driving', name: 'Not driving', summary: 'Parked the whole time: the battery gets no alternator charge.', minutes: [0, 0, 0, 0, 0, 0, 0], startHour: 10 },
  { key: 'mostly-parked', name: 'Mostly parked', summary: 'One 45-minute drive a week, on Saturday morning.', minutes: [0, 0, 0, 0, 0, 45, 0], startHour: 10 },
  { key: 'short-drive', name: 'A short drive most days', summary: 'Half an hour on six days, a rest day on Sunday.', minutes: [30, 30, 30, 30, 30, 30, 0], startHour: 10 },
  { key: 'on-the-move', name: 'On the move', summary: 'Two hours of driving every day.', minutes: [120, 120, 120, 120, 120, 120, 120], startHour: 9 },
];

export const ROUTINE_KEYS = ROUTINE_PRESETS.map((r) => r.key) as [RoutineKey, ...RoutineKey[]];

const DAY = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

/** The week's driving in words: "30 min on 6 days a week (Mon to Sat) from 10:00". */
export function describeDriving(minutes: readonly number[], startHour: number): string {
  const days = minutes.map((m, i) => (m > 0 ? i : -1)).filter((i) => i >= 0);
  if (!days.length) return 'no driving';
  const total = minutes.reduce((s, m) => s + m, 0);
  const same = days.every((i) => minutes[i] === minutes[days[0]]);
  const when = `from ${String(startHour).padStart(2, '0')}:00`;
  if (days.length === 1) return `${minutes[days[0]]} min on ${DAY[days[0]]} ${when}`;
  // A run of days reads as "Mon to Sat"; scattered days are listed.
  const run = days.every((d, k) => k === 0 || d === days[k - 1] + 1);
  const which = run && days.length > 2 ? `${DAY[days[0]]} to ${DAY[days[days.length - 1]]}` : days.map((i) => DAY[i]).join(', ');
  if (same) return `${minutes[days[0]]} min on ${days.length === 7 ? 'every day' : `${days.length} days a week (${which})`} ${when}`;
  return `${total} min a week over ${days.length} days ${when}`;
}

/** The routine a rig's charging follows: the preset it matches, or the rig's own. */
export function routineOf(charging: Pick<RigPower['charging'], 'drivingMinutesPerDay' | 'drivingStartHour'>): { key: RoutineKey | 'own'; name: string; description: string } {
  const { drivingMinutesPerDay: minutes, drivingStartHour: start } = charging;
  const description = describeDriving(minutes, start);
  const none = minutes.every((m) => m === 0);
  const preset = ROUTINE_PRESETS.find((p) => p.minutes.every((m, i) => m === minutes[i]) && (none || p.startHour === start));
  return preset ? { key: preset.key, name: preset.name, description } : { key: 'own', name: 'Your own routine', description };
}
