import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';
import { WREN_POWER } from './helpers';

const { fx } = withHousehold();

type Field = { path: string; message: string };

describe('plain messages naming the field', () => {
  it('answers every bad field of a new rig at once, each in words that name it', async () => {
    const res = await fx.agents.owner
      .post('/api/rigs')
      .send({ name: '', vehicle: 'x'.repeat(121), power: { ...WREN_POWER, battery: { chemistry: 'agm', capacityAh: 0 }, charging: { alternatorA: 20, drivingMinutesPerDay: [0, 0, 2000, 0, 0, 0, 0] } } })
      .expect(400);
    const fields = res.body.fields as Field[];
    expect(fields).toEqual(
      expect.arrayContaining([
        { path: 'name', message: 'Give the rig a name.' },
        { path: 'vehicle', message: 'Vehicle can be at most 120 characters.' },
        { path: 'power.battery.capacityAh', message: 'Battery capacity must be at least 1 Ah.' },
        { path: 'power.charging.drivingMinutesPerDay.2', message: "Wednesday's driving can be at most 1,440 min." },
      ]),
    );
    expect(JSON.stringify(fields)).not.toMatch(/Too small|Too big|expected/);
  });

  it('refuses a time zone the runtime does not know, naming the field', async () => {
    const res = await fx.agents.member
      .put('/api/me/email-prefs')
      .send({ reportsOn: true, reportWeekday: 6, reportHour: 18, timeZone: 'Mars/Olympus', warningsOn: true, warnAt: 'tight', noteEmailsOn: true })
      .expect(400);
    expect(res.body.fields).toEqual([{ path: 'timeZone', message: expect.stringMatching(/time zone/) }]);
  });
});
