import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { type ProjectionInputRaw, projectionInputSchema } from '@/shared/schemas/projection';
import { bareRig } from './rigs';

const parse = (raw: ProjectionInputRaw) => projectionInputSchema.parse(raw);

describe('a stay longer than the horizon still gets a margin', () => {
  // 100 Ah AGM to its 50 % cut-off is 50 Ah; a constant 2.5 Ah a day (0.104 A, below the 5 A 20-hour rate,
  // so no Peukert) reaches it on day 20.
  const slow = (stay: number, ahPerDay = 2.5) =>
    project(parse(bareRig({ plannedStayDays: stay, loads: [{ name: 'Router', supply: 'dc', amps: ahPerDay / 24, hoursPerDay: 24 }] })));

  it('a 25-day stay whose cut-off comes on day 20 is Short by 5 days, over a run of 33 days', () => {
    const p = slow(25);
    // The run covers the stay and its tight margin: 25 + max(1, 25 % of 25) + 1 = 32.25, so 33 days.
    expect(p.margin.coveredDays).toBe(33);
    expect(p.routine.daysToCutoff).toBeCloseTo(20, 2);
    expect(p.margin.days).toBeCloseTo(-5, 2);
    expect(p.margin.state).toBe('short');
    expect(p.series).toHaveLength(14 * 24); // the chart still shows the horizon
    expect(p.warnings.find((w) => w.code === 'stay-beyond-horizon')?.figures).toMatchObject({ coveredDays: 33 });
  });

  it('no cut-off within the run is Comfortable only when the routine holds', () => {
    // 0.5 Ah a day takes 100 days to the cut-off: beyond the 60-day run, yet the routine does not hold.
    const p = slow(60, 0.5);
    expect(p.routine.daysToCutoff).toBeNull();
    expect(p.routine.holds).toBe(false);
    expect(p.margin.atLeastDays).toBe(0);
    expect(p.margin.state).toBe('tight');
  });
});

describe('"holds" is judged on the repeating week', () => {
  // 100 Ah AGM, a 1 A load (24 Ah a day), a 30 A DC-DC charger on a daily 1-hour drive at 10:00. Below its
  // taper the battery gains (30 − 1) × 0.9 = 26.1 Ah a drive against 23 Ah parked: the week holds near full.
  const rig = (weekday: number, hour: number, startSocPercent = 100) =>
    project(
      parse(
        bareRig(
          {
            loads: [{ name: 'Lamp', supply: 'dc', amps: 1, hoursPerDay: 24 }],
            charging: { alternatorA: 30, charger: 'dc-dc', drivingMinutesPerDay: [60, 60, 60, 60, 60, 60, 60], drivingStartHour: 10 },
            start: { weekday, hour },
          },
          { startSocPercent },
        ),
      ),
      { fixes: false },
    );

  it('holds, with the same week\'s balance, whatever the hour it starts', () => {
    const first = rig(0, 0);
    expect(first.routine.holds).toBe(true);
    for (const [d, h] of [[0, 9], [0, 11], [3, 18], [6, 23]]) {
      const p = rig(d, h);
      expect(p.routine.holds).toBe(true);
      expect(p.daily).toEqual(first.daily);
      expect(p.balance).toEqual(first.balance);
    }
  });

  it('reports the week\'s balance: 168 Ah used, as much put back, the rest of the 210 Ah offered not stored', () => {
    // In the repeating week the battery ends where it began, so what is put back equals what is used:
    // 1 A × 168 h = 168 Ah. The charger offers 30 A × 7 h = 210 Ah; 42 Ah of it is not stored (full, taper, losses).
    const p = rig(0, 0);
    expect(p.balance.usedAh).toBeCloseTo(168, 6);
    expect(p.balance.putBackAh).toBeCloseTo(168, 1);
    expect(p.balance.offeredAh).toBeCloseTo(210, 6);
    expect(p.balance.notStoredAh).toBeCloseTo(42, 1);
    expect(p.daily.consumptionAh).toBeCloseTo(24, 6);
  });

  it('the Outlook\'s first point is the starting state of charge', () => {
    const p = rig(2, 7, 64);
    expect(p.start).toEqual({ socPercent: 64, weekday: 2, hourOfDay: 7 });
    expect(p.series[0].hour).toBe(1);
  });
});
