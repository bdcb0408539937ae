import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { fx } = withHousehold();

const rig = () => fx.agents.owner.get(`/api/rigs/${fx.rigId}`).expect(200).then((r) => r.body);
const outlook = () => fx.agents.owner.get(`/api/rigs/${fx.rigId}/outlook`).expect(200).then((r) => r.body);
const history = () => fx.agents.owner.get(`/api/rigs/${fx.rigId}/history`).expect(200).then((r) => r.body.history);

describe('a Fix previewed, applied and undone', () => {
  it('previews the figures before and after without saving anything', async () => {
    const before = await rig();
    const o = await outlook();
    const res = await fx.agents.advisor.post(`/api/rigs/${fx.rigId}/fixes/preview`).send({ kind: 'ignition-relay' }).expect(200);
    // The preview's "now" is the Outlook itself; the Fix's gain is the Outlook's figure for it.
    const fix = o.fixes.find((f: { kind: string }) => f.kind === 'ignition-relay');
    expect(res.body.before.daysParked).toBe(o.parked.daysToCutoff);
    expect((res.body.after.daysParked ?? o.horizonDays) - (res.body.before.daysParked ?? o.horizonDays)).toBeCloseTo(fix.daysGainedParked, 2);
    expect((await rig()).version).toBe(before.version);
  });

  it('lets only the owner apply it', async () => {
    const { version } = await rig();
    await fx.agents.member.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'ignition-relay', version }).expect(403);
    await fx.agents.advisor.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'ignition-relay', version }).expect(403);
    await fx.agents.outsider.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'ignition-relay', version }).expect(404);
    expect((await rig()).power.inverter.control).toBe('always-on');
  });

  it('applies it with one history entry, and History undoes it once', async () => {
    const start = await rig();
    const days = (await outlook()).parked.daysToCutoff;
    const stale = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'ignition-relay', version: start.version + 5 });
    expect(stale.status).toBe(409);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'ignition-relay', version: start.version }).expect(200);
    const applied = await rig();
    expect(applied.power.inverter.control).toBe('ignition-relay');
    expect(applied.version).toBe(start.version + 1);
    const [entry] = await history();
    expect(entry).toMatchObject({ kind: 'fix', undoable: true, daysParkedBefore: days });
    expect(entry.summary).toMatch(/ignition-keyed relay/);
    // The hook-up follows the saved rig: a 300 W inverter on a 40 A relay (see hookups.test.ts).
    const plan = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/hookup`).expect(200);
    expect(plan.body.control).toBe('ignition-relay');

    await fx.agents.member.post(`/api/rigs/${fx.rigId}/history/${entry.id}/undo`).expect(403);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/history/${entry.id}/undo`).expect(200);
    const undone = await rig();
    expect(undone.power).toEqual(start.power);
    expect((await outlook()).parked.daysToCutoff).toBe(days);
    const [undoEntry, fixEntry] = await history();
    expect(undoEntry.summary).toMatch(/^undid: applied the Fix/);
    expect(fixEntry.undoable).toBe(false);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/history/${entry.id}/undo`).expect(409);
  });

  it('refuses to undo once the power system has moved on', async () => {
    const start = await rig();
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/apply`).send({ kind: 'cutoff-switch', version: start.version }).expect(200);
    const [entry] = await history();
    const now = await rig();
    await fx.agents.owner
      .patch(`/api/rigs/${fx.rigId}`)
      .send({ version: now.version, power: { ...now.power, battery: { ...now.power.battery, capacityAh: 120 } } })
      .expect(200);
    const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/history/${entry.id}/undo`).expect(409);
    expect(res.body.message).toMatch(/changed since/);
  });

  it('answers 400 naming the field for an unknown Fix, 404 for one the rig does not have', async () => {
    const bad = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/preview`).send({ kind: 'bigger-alternator' }).expect(400);
    expect(bad.body.fields.map((f: { path: string }) => f.path)).toContain('kind');
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/fixes/preview`).send({ kind: 'cutoff-switch' }).expect(404);
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/history/not-an-id/undo`).expect(400);
  });
});
