import { describe, expect, it } from 'vitest';

import { withHousehold } from '../fixtures';

const { fx } = withHousehold();

describe('two people editing one rig at once', () => {
  it('lets one succeed and answers the other 409; the winner’s change is kept whole, nothing else is lost', async () => {
    const owner2 = fx.agents.owner;
    const rig = (await owner2.get(`/api/rigs/${fx.rigId}`)).body;
    // Both start from the same version; one changes the battery, the other the planned stay.
    const a = owner2.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, power: { ...rig.power, battery: { ...rig.power.battery, capacityAh: 210 } } });
    const b = owner2.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, power: { ...rig.power, plannedStayDays: 9 } });
    const [ra, rb] = await Promise.all([a, b]);
    expect([ra.status, rb.status].sort()).toEqual([200, 409]);
    const loser = ra.status === 409 ? ra : rb;
    expect(loser.body.fields[0].path).toBe('version');
    const after = (await owner2.get(`/api/rigs/${fx.rigId}`)).body;
    expect(after.version).toBe(rig.version + 1);
    if (ra.status === 200) expect([after.power.battery.capacityAh, after.power.plannedStayDays]).toEqual([210, rig.power.plannedStayDays]);
    else expect([after.power.battery.capacityAh, after.power.plannedStayDays]).toEqual([rig.power.battery.capacityAh, 9]);
    // Loads added at the same moment by two people are both kept (each load is its own row).
    const [l1, l2] = await Promise.all([
      fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Kettle', supply: 'ac', watts: 100, hoursPerDay: 0.1 }),
      owner2.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Radio', supply: 'dc', watts: 5, hoursPerDay: 2 }),
    ]);
    expect([l1.status, l2.status]).toEqual([201, 201]);
    const names = (await owner2.get(`/api/rigs/${fx.rigId}`)).body.loads.map((l: { name: string }) => l.name);
    expect(names).toEqual(expect.arrayContaining(['Kettle', 'Radio']));
  });
});
