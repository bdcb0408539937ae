import { describe, expect, it } from 'vitest';

import { describeDriving, ROUTINE_PRESETS, routineOf } from '@/shared/routines';

describe('named routines', () => {
  it('names a preset when the minutes and start hour match it', () => {
    for (const p of ROUTINE_PRESETS) expect(routineOf({ drivingMinutesPerDay: [...p.minutes], drivingStartHour: p.startHour }).name).toBe(p.name);
  });

  it('calls an adjusted week the rig\'s own routine, and says what it is', () => {
    const r = routineOf({ drivingMinutesPerDay: [30, 30, 30, 30, 30, 30, 10], drivingStartHour: 10 });
    expect(r).toEqual({ key: 'own', name: 'Your own routine', description: '190 min a week over 7 days from 10:00' });
  });

  it('describes a week of driving in words', () => {
    expect(describeDriving([0, 0, 40, 0, 0, 0, 0], 11)).toBe('40 min on Wed from 11:00');
    expect(describeDriving([30, 30, 30, 30, 30, 30, 0], 10)).toBe('30 min on 6 days a week (Mon to Sat) from 10:00');
    expect(describeDriving([120, 120, 120, 120, 120, 120, 120], 9)).toBe('120 min on every day from 09:00');
    expect(describeDriving([0, 0, 0, 0, 0, 0, 0], 10)).toBe('no driving');
    expect(describeDriving([20, 0, 20, 0, 20, 0, 0], 8)).toBe('20 min on 3 days a week (Mon, Wed, Fri) from 08:00');
  });
});
