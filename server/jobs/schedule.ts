// When a weekly report is due, in the person's own time zone. Weekdays count from Monday = 0 to
// Sunday = 6, as the routine does. Pure: the caller passes the time, so tests control the clock.

const formatters = new Map<string, Intl.DateTimeFormat>();
const WEEKDAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

function formatter(timeZone: string) {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', { timeZone, hourCycle: 'h23', weekday: 'short', year: 'numeric', month: '2-digit', day: '2-digit', hour: '2-digit', minute: '2-digit', second: '2-digit' });
    formatters.set(timeZone, f);
  }
  return f;
}

export function isTimeZone(tz: string): boolean {
  try {
    formatter(tz);
    return true;
  } catch {
    return false;
  }
}

/** The wall-clock parts of an instant in a time zone. */
export function localParts(at: Date, timeZone: string) {
  const parts = Object.fromEntries(formatter(timeZone).formatToParts(at).map((p) => [p.type, p.value]));
  return {
    weekday: WEEKDAYS.indexOf(parts.weekday),
    date: `${parts.year}-${parts.month}-${parts.day}`,
    hour: Number(parts.hour),
    minute: Number(parts.minute),
    second: Number(parts.second),
  };
}

const HOUR = 3_600_000;

/**
 * The latest instant at or before `at` when the person's weekday and hour came round in their zone,
 * and the local date of that instant (the report's week key). Across a change of clocks the instant
 * can be an hour off; the report then goes an hour early or late that week.
 */
export function lastOccurrence(at: Date, timeZone: string, weekday: number, hour: number) {
  const now = localParts(at, timeZone);
  const hoursBack = (((now.weekday - weekday) * 24 + (now.hour - hour)) % 168 + 168) % 168;
  const instant = new Date(at.getTime() - hoursBack * HOUR - now.minute * 60_000 - now.second * 1000 - at.getMilliseconds());
  return { instant, weekKey: localParts(instant, timeZone).date };
}

/** A report is due when its hour has come this week and it is at most `graceHours` late (a server that was down catches up). */
export function reportDue(at: Date, pref: { timeZone: string; weekday: number; hour: number }, graceHours = 6) {
  const last = lastOccurrence(at, pref.timeZone, pref.weekday, pref.hour);
  const lateMs = at.getTime() - last.instant.getTime();
  return lateMs < graceHours * HOUR ? last : null;
}
