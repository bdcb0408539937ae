import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';
import { signIn, verifiedUser } from './helpers';

const { ctx, fx } = withHousehold();

type Entry = { kind: string; summary: string; actor: { name: string }; daysParkedBefore: number | null; daysParkedAfter: number | null };
const history = async () => (await fx.agents.member.get(`/api/rigs/${fx.rigId}/history`).expect(200)).body.history as Entry[];
const daysParked = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/outlook`).expect(200)).body.parked.daysToCutoff as number | null;
const rig = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`).expect(200)).body;

describe('rig history', () => {
  it('begins with the rig\'s creation: who made it, what it is, its routine and its Days parked', async () => {
    const all = await history();
    const created = all[all.length - 1];
    expect(created).toMatchObject({ kind: 'rig-created', actor: { name: 'owner' }, summary: 'created the rig Fixture van (100 Ah AGM, 300 W inverter, 1 load, routine: Your own routine)', daysParkedBefore: null });
    expect(created.daysParkedAfter).toBe(await daysParked());
  });

  it('records cable runs added, edited and removed, without moving the forecast', async () => {
    const days = await daysParked();
    const run = { label: 'Fan feed', to: 'Roof fan', lengthM: 3, currentA: 2, maxDropPercent: 3, cableType: 'marine' };
    const added = await fx.agents.member.post(`/api/rigs/${fx.rigId}/cable-runs`).send(run).expect(201);
    let [top] = await history();
    expect(top).toMatchObject({ kind: 'cable-run-added', actor: { name: 'member' }, summary: 'added the cable run Fan feed (Battery → Roof fan, 3 m, 2 A)', daysParkedBefore: days, daysParkedAfter: days });
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/cable-runs/${added.body.id}`).send({ ...run, lengthM: 4.5 }).expect(200);
    [top] = await history();
    expect(top).toMatchObject({ kind: 'cable-run-edited', actor: { name: 'owner' }, summary: 'edited the cable run Fan feed: 3 m → 4.5 m' });
    // Where it runs and the cable change its size, so History names them.
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/cable-runs/${added.body.id}`).send({ ...run, lengthM: 4.5, route: 'engine-bay', cableType: 'pvc' }).expect(200);
    [top] = await history();
    expect(top).toMatchObject({ kind: 'cable-run-edited', summary: 'edited the cable run Fan feed: now runs through the engine bay, now in PVC automotive (GPT), 80 °C' });
    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/cable-runs/${added.body.id}`).expect(204);
    [top] = await history();
    expect(top).toMatchObject({ kind: 'cable-run-removed', summary: 'removed the cable run Fan feed (Battery → Roof fan, 4.5 m, 2 A)' });
    // A refused delete of a run that is gone leaves no entry.
    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/cable-runs/${added.body.id}`).expect(404);
    expect((await history())[0].kind).toBe('cable-run-removed');
  });

  it('keeps who changed which load, with the Days parked before and after', async () => {
    const d0 = await daysParked();
    const added = await fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Laptop', supply: 'dc', watts: 60, hoursPerDay: 3 }).expect(201);
    const d1 = await daysParked();
    let [top] = await history();
    expect(top).toMatchObject({ kind: 'load-added', actor: { name: 'member' }, summary: 'added Laptop (60 W, 3 h a day)', daysParkedBefore: d0, daysParkedAfter: d1 });
    expect(d1!).toBeLessThan(d0!);

    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/loads/${added.body.id}`).send({ name: 'Laptop', supply: 'dc', watts: 45, hoursPerDay: 4 }).expect(200);
    const d2 = await daysParked();
    [top] = await history();
    expect(top).toMatchObject({ kind: 'load-edited', actor: { name: 'owner' }, summary: 'edited Laptop: 60 W → 45 W, 3 h → 4 h a day', daysParkedBefore: d1, daysParkedAfter: d2 });

    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/loads/${added.body.id}`).expect(204);
    [top] = await history();
    expect(top).toMatchObject({ kind: 'load-removed', summary: 'removed Laptop (45 W, 4 h a day)', daysParkedBefore: d2, daysParkedAfter: await daysParked() });
  });

  it('names the battery, inverter and routine changes', async () => {
    const r = await rig();
    const before = await daysParked();
    await fx.agents.owner
      .patch(`/api/rigs/${fx.rigId}`)
      .send({ version: r.version, power: { ...r.power, battery: { ...r.power.battery, capacityAh: 200 }, inverter: { ...r.power.inverter, control: 'manual-switch' }, charging: { ...r.power.charging, drivingMinutesPerDay: [30, 0, 40, 0, 0, 0, 0] } } })
      .expect(200);
    const [top] = await history();
    expect(top.kind).toBe('battery');
    expect(top.summary).toBe('changed battery (100 Ah → 200 Ah); inverter (always-on → manual-switch); routine (40 → 70 min of driving a week)');
    expect(top.daysParkedBefore).toBe(before);
    expect(top.daysParkedAfter).toBe(await daysParked());
    expect(top.daysParkedAfter!).toBeGreaterThan(before!);
  });

  it('records people joining, changing role and leaving', async () => {
    const newcomer = await verifiedUser(ctx, 'newcomer');
    const inv = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/invitations`).send({ email: newcomer.email, role: 'member' }).expect(201);
    const agent = await signIn(ctx.app, newcomer.email);
    await agent.post(`/api/invitations/${inv.body.id}/accept`).expect(204);
    let [top] = await history();
    expect(top).toMatchObject({ kind: 'member-joined', actor: { name: 'newcomer' }, summary: 'joined the household as member' });
    expect(top.daysParkedBefore).toBe(top.daysParkedAfter);

    await agent.post(`/api/rigs/${fx.rigId}/leave`).expect(204);
    [top] = await history();
    expect(top).toMatchObject({ kind: 'member-left', actor: { name: 'newcomer' } });
    // Someone who left no longer reads the rig's history.
    await agent.get(`/api/rigs/${fx.rigId}/history`).expect(404);
    await fx.agents.outsider.get(`/api/rigs/${fx.rigId}/history`).expect(404);
  });
});
