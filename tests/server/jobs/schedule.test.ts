import { describe, expect, it } from 'vitest';

import { lastOccurrence, localParts, reportDue } from '@/server/jobs/schedule';

// Time-zone offsets below are from the IANA tz database as shipped with Node's ICU (from memory of the
// rules: Lisbon WET/WEST, Los Angeles PST/PDT, Tokyo JST without daylight saving).
describe('weekly report schedule', () => {
  it('finds Sunday 18:00 in Lisbon (winter, UTC+0) and in Los Angeles (winter, UTC-8)', () => {
    const at = new Date('2026-12-07T03:00:00Z'); // Monday 03:00 UTC
    expect(lastOccurrence(at, 'Europe/Lisbon', 6, 18).instant.toISOString()).toBe('2026-12-06T18:00:00.000Z');
    expect(lastOccurrence(at, 'America/Los_Angeles', 6, 18).instant.toISOString()).toBe('2026-12-07T02:00:00.000Z');
    expect(lastOccurrence(at, 'America/Los_Angeles', 6, 18).weekKey).toBe('2026-12-06');
  });

  it('in summer time Lisbon is UTC+1', () => {
    const at = new Date('2026-07-05T17:30:00Z'); // Sunday 18:30 in Lisbon
    expect(localParts(at, 'Europe/Lisbon')).toMatchObject({ weekday: 6, hour: 18, minute: 30 });
    expect(lastOccurrence(at, 'Europe/Lisbon', 6, 18).instant.toISOString()).toBe('2026-07-05T17:00:00.000Z');
  });

  it('is due from the hour for six hours, then waits for next week', () => {
    const pref = { timeZone: 'Asia/Tokyo', weekday: 0, hour: 7 }; // Monday 07:00 JST = Sunday 22:00 UTC
    expect(reportDue(new Date('2026-12-06T21:59:00Z'), pref)).toBeNull();
    expect(reportDue(new Date('2026-12-06T22:00:00Z'), pref)?.weekKey).toBe('2026-12-07');
    expect(reportDue(new Date('2026-12-07T03:59:00Z'), pref)?.weekKey).toBe('2026-12-07');
    expect(reportDue(new Date('2026-12-07T04:00:00Z'), pref)).toBeNull();
  });
});
