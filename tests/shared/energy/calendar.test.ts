import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { projectionInputSchema, type ProjectionInputRaw } from '@/shared/schemas/projection';

// A 100 Ah AGM bank with a 2 A DC load all day and 200 W of panels, derate 75 %.
const base: ProjectionInputRaw = {
  battery: { chemistry: 'agm', capacityAh: 100, selfDischargePercentPerMonth: 0 },
  loads: [{ name: 'Fridge', supply: 'dc', amps: 2, hoursPerDay: 24 }],
  charging: { solarW: 200, solarDeratePercent: 75 },
  start: { weekday: 0, hour: 0 },
  horizonDays: 14,
};
const run = (extra: Partial<ProjectionInputRaw>) => project(projectionInputSchema.parse({ ...base, ...extra }), { fixes: false });

describe('the projection follows the calendar', () => {
  it('keeps today\'s answer without a date and a place', () => {
    const plain = run({});
    expect(plain.solar.source).toBe('peak-sun-hours');
    expect(plain.solar.dailyAh).toEqual(Array(14).fill(0));
    // A place alone (no date) changes nothing either.
    expect(run({ location: { latitudeDeg: 50 } }).series).toEqual(plain.series);
  });

  it('takes the weekday from the date', () => {
    // 21 December 2026 is a Monday (weekday 0), 24 December a Thursday (3).
    const p = run({ start: { weekday: 5, hour: 0, date: '2026-12-24' }, location: { latitudeDeg: 50 } });
    expect(p.series[0].weekday).toBe(3);
  });

  it('reports the sun it used: 200 W at 50° N puts back far less in December than in June', () => {
    const december = run({ start: { hour: 0, date: '2026-12-21' }, location: { latitudeDeg: 50 } });
    const june = run({ start: { hour: 0, date: '2026-06-21' }, location: { latitudeDeg: 50 } });
    expect(december.solar.source).toBe('place-and-date');
    // Worked by hand from FAO-56 eqs. 21 and 37 (see solar.test.ts): 200 W × 1.55 h × 0.75 / 12 V = 19.4 Ah on
    // 21 December, 200 W × 8.71 h × 0.75 / 12 V = 109 Ah on 21 June.
    expect(december.solar.dailyAh[0]).toBeCloseTo(19.4, 0);
    expect(june.solar.dailyAh[0]).toBeCloseTo(109, -1);
    expect(december.solar.dailyAh).toHaveLength(14);
    // The fridge takes 48 Ah a day: June's sun carries it, December's does not.
    expect(june.routine.daysToCutoff).toBeNull();
    expect(december.routine.daysToCutoff).not.toBeNull();
    // Without sun at all the 50 Ah to the AGM cut-off last 25 h; December's sun stretches it to under 2 days.
    expect(december.routine.daysToCutoff!).toBeGreaterThan(25 / 24);
    expect(december.routine.daysToCutoff!).toBeLessThan(2);
  });

  it('leaves a given peakSunHours in charge', () => {
    const fixed = run({ start: { hour: 0, date: '2026-12-21' }, location: { latitudeDeg: 50 }, charging: { solarW: 200, solarDeratePercent: 75, peakSunHours: 5 } });
    expect(fixed.solar.source).toBe('peak-sun-hours');
    expect(fixed.solar.dailyAh[0]).toBeCloseTo((200 * 5 * 0.75) / 12, 6);
  });

  it('sizes the solar Fix in the sun of the place and season', () => {
    const p = project(projectionInputSchema.parse({ ...base, start: { hour: 0, date: '2026-12-21' }, location: { latitudeDeg: 50 } }));
    const solar = p.fixes.find((f) => f.kind === 'solar')!;
    expect(solar.summary).toContain('in the sun of this place and season');
    // By hand: 48 Ah a day / (1.55 h × 0.75 / 12 V) = 495 W in late December at 50° N (not 4 h of sun's 155 W).
    const watts = (solar.change as { charging: { solarW: number; peakSunHours: number } }).charging;
    expect(watts.peakSunHours).toBe(0);
    expect(watts.solarW).toBeGreaterThan(480);
    expect(watts.solarW).toBeLessThan(560);
  });

  it('gives polar night no sun and no NaN', () => {
    const p = run({ start: { hour: 0, date: '2026-12-21' }, location: { latitudeDeg: 75 } });
    expect(p.solar.dailyAh.every((x) => x === 0)).toBe(true);
    expect(p.series.every((s) => Number.isFinite(s.socPercent))).toBe(true);
  });
});
