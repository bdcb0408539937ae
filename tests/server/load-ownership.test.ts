import { sql } from 'kysely';
import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { ctx, fx } = withHousehold();

const LOAD = { name: 'Reading lamp', supply: 'dc', watts: 5, hoursPerDay: 2, startHour: 21 };
const rig = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`).expect(200)).body;
const history = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}/history`).expect(200)).body.history as unknown[];
/** Margin checks waiting in this app's own pg-boss schema for the fixture rig (what sends the low-margin e-mail). */
async function marginChecks() {
  const schema = ctx.config.JOBS_SCHEMA;
  const { rows } = await sql<{ n: string }>`select count(*) as n from ${sql.table(`${schema}.job`)} where name = 'margin-check' and data->>'rigId' = ${fx.rigId}`.execute(ctx.db);
  return Number(rows[0].n);
}
async function drainMarginChecks() {
  await sql`delete from ${sql.table(`${ctx.config.JOBS_SCHEMA}.job`)} where name = 'margin-check'`.execute(ctx.db);
}

describe('who may change a load', () => {
  it("lets a member edit and delete a load they added, and refuses one someone else added with 403", async () => {
    const own = await fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send(LOAD).expect(201);
    const owners = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/loads`).send({ ...LOAD, name: 'Owner lamp' }).expect(201);

    await fx.agents.member.patch(`/api/rigs/${fx.rigId}/loads/${own.body.id}`).send({ ...LOAD, watts: 6 }).expect(200);
    const refused = await fx.agents.member.patch(`/api/rigs/${fx.rigId}/loads/${owners.body.id}`).send({ ...LOAD, name: 'Owner lamp', watts: 60 }).expect(403);
    expect(refused.body.code).toBe('forbidden');
    expect(refused.body.message).toMatch(/Owner lamp/);
    await fx.agents.member.delete(`/api/rigs/${fx.rigId}/loads/${owners.body.id}`).expect(403);

    const saved = (await rig()).loads.find((l: { id: string }) => l.id === owners.body.id);
    expect(saved.watts).toBe(5);
    // The owner changes anyone's load.
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/loads/${own.body.id}`).send({ ...LOAD, watts: 7 }).expect(200);
    await fx.agents.member.delete(`/api/rigs/${fx.rigId}/loads/${own.body.id}`).expect(204);
    await fx.agents.owner.delete(`/api/rigs/${fx.rigId}/loads/${owners.body.id}`).expect(204);
  });

  it('tells the client who it is and what it may change', async () => {
    const member = (await fx.agents.member.get(`/api/rigs/${fx.rigId}`).expect(200)).body;
    expect(member.viewerId).toBe(fx.users.member.id);
    expect(member.permissions).toMatchObject({ manageLoads: true, editAnyLoad: false });
    expect((await rig()).permissions).toMatchObject({ manageLoads: true, editAnyLoad: true });
  });
});

describe('a save that changes nothing', () => {
  it('keeps the rig at its version, writes no history and queues no margin check (no margin e-mail)', async () => {
    const before = await rig();
    const entries = (await history()).length;
    await drainMarginChecks();

    const res = await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: before.version, name: before.name, vehicle: before.vehicle, power: before.power }).expect(200);
    expect(res.body.version).toBe(before.version);
    const load = before.loads[0];
    const { id: _id, addedBy: _by, ...same } = load;
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/loads/${load.id}`).send(same).expect(200);

    const after = await rig();
    expect(after.version).toBe(before.version);
    expect(after.updatedAt).toBe(before.updatedAt);
    expect(await history()).toHaveLength(entries);
    // The margin check is queued after the answer is sent: give it the time it would take.
    await new Promise((r) => setTimeout(r, 300));
    expect(await marginChecks()).toBe(0);

    // A real change does all three.
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: before.version, power: { ...before.power, plannedStayDays: before.power.plannedStayDays + 1 } }).expect(200);
    expect((await rig()).version).toBe(before.version + 1);
    expect(await history()).toHaveLength(entries + 1);
    await new Promise((r) => setTimeout(r, 300));
    expect(await marginChecks()).toBe(1);
  });

  it('still refuses a stale version', async () => {
    const before = await rig();
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: before.version - 1, name: before.name }).expect(409);
  });
});
