import { describe, expect, it } from 'vitest';

import { project } from '@/shared/energy/project';
import { WREN } from '@/shared/demo/scenario';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { withHousehold } from './fixtures';
import { signIn } from './helpers';

const { ctx, fx } = withHousehold();

describe('the saved rig through the model', () => {
  it("gives the seeded Wren's Outlook the same figures as the model run directly on the same input", async () => {
    const ines = await signIn(ctx.app, 'ines@example.org', 'keyoff-demo-2026');
    const res = await ines.get(`/api/rigs/${fx.seeded.wren}/outlook`).expect(200);
    const direct = project(projectionInputSchema.parse(WREN));
    expect(res.body.parked).toEqual(direct.parked);
    expect(res.body.routine).toEqual(direct.routine);
    expect(res.body.daily).toEqual(direct.daily);
    expect(res.body.fixes.map((f: { kind: string }) => f.kind)).toEqual(direct.fixes.map((f) => f.kind));
    expect(res.body.series).toHaveLength(direct.series.length);
  });

  it('tries a candidate without saving it, then counts it once adopted', async () => {
    const candidate = { name: 'Coffee maker', supply: 'ac', watts: 280, hoursPerDay: 0.25, startHour: 8 };
    const tried = await fx.agents.member.post(`/api/rigs/${fx.rigId}/try`).send({ candidates: [candidate] }).expect(200);
    expect(tried.body.delta.dailyAh).toBeGreaterThan(0);
    const before = (await fx.agents.member.get(`/api/rigs/${fx.rigId}/outlook`)).body.daily.consumptionAh;
    await fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send({ ...candidate, status: 'installed' }).expect(201);
    const after = (await fx.agents.member.get(`/api/rigs/${fx.rigId}/outlook`)).body.daily.consumptionAh;
    expect(after - before).toBeCloseTo(tried.body.delta.dailyAh, 1);
  });
});

describe('the Outlook over HTTP', () => {
  it('carries an entity tag: 304 for the same tag, a new tag once the rig changes', async () => {
    const owner = fx.agents.owner;
    const first = await owner.get(`/api/rigs/${fx.rigId}/outlook`).expect(200);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^"outlook-/);
    expect(first.headers['cache-control']).toBe('no-store');
    const again = await owner.get(`/api/rigs/${fx.rigId}/outlook`).set('If-None-Match', tag).expect(304);
    expect(again.text ?? '').toBe('');
    const rig = (await owner.get(`/api/rigs/${fx.rigId}`)).body;
    await owner.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, vehicle: 'Tagged van' }).expect(200);
    const changed = await owner.get(`/api/rigs/${fx.rigId}/outlook`).set('If-None-Match', tag).expect(200);
    expect(changed.headers.etag).not.toBe(tag);
    expect(changed.body.version).toBe(rig.version + 1);
  });

  it('is gzipped for a client that takes gzip and plain JSON for one that does not, with the same figures', async () => {
    const gz = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/outlook`).set('Accept-Encoding', 'gzip').expect(200);
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gz.headers.vary).toMatch(/Accept-Encoding/);
    const plain = await fx.agents.owner.get(`/api/rigs/${fx.rigId}/outlook`).set('Accept-Encoding', 'identity').expect(200);
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(gz.body).toEqual(plain.body);
    expect(Number(gz.headers['content-length'])).toBeLessThan(Number(plain.headers['content-length']) / 4);
  });
});

describe('editing a rig', () => {
  it('refuses a stale edit with 409 and keeps the other change', async () => {
    const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, vehicle: 'First edit' }).expect(200);
    const stale = await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: rig.version, vehicle: 'Second edit' }).expect(409);
    expect(stale.body.message).toMatch(/Someone else changed this rig/);
    expect((await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body.vehicle).toBe('First edit');
  });

  it('records who added each load, and moves the last change on', async () => {
    const before = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    const res = await fx.agents.member.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Tablet', supply: 'dc', watts: 12, hoursPerDay: 2 }).expect(201);
    expect(res.body.addedBy.id).toBe(fx.users.member.id);
    const after = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    expect(after.version).toBe(before.version + 1);
  });

  it('refuses bad loads naming the field, and saves nothing', async () => {
    const count = async () => (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body.loads.length;
    const n = await count();
    for (const bad of [
      { name: '', supply: 'dc', watts: 10, hoursPerDay: 1 },
      { name: 'Heater', supply: 'dc', watts: -5, hoursPerDay: 1 },
      { name: 'Heater', supply: 'dc', watts: 'lots', hoursPerDay: 1 },
      { name: 'Heater', supply: 'dc', watts: 100000, hoursPerDay: 1 },
      { name: 'Heater', supply: 'dc', watts: 10, hoursPerDay: 25 },
      { name: 'Heater', supply: 'dc', watts: 10, hoursPerDay: 1, colour: 'red' },
    ]) {
      const res = await fx.agents.owner.post(`/api/rigs/${fx.rigId}/loads`).send(bad);
      expect(res.status).toBe(400);
      expect(res.body.fields.length).toBeGreaterThan(0);
    }
    expect(await count()).toBe(n);
  });

  it('refuses power that the loads cannot run on (AC loads without an inverter)', async () => {
    const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    await fx.agents.owner.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Laptop', supply: 'ac', watts: 60, hoursPerDay: 2 }).expect(201);
    const fresh = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    const res = await fx.agents.owner.patch(`/api/rigs/${fx.rigId}`).send({ version: fresh.version, power: { ...rig.power, inverter: null } }).expect(400);
    expect(res.body.fields[0].path).toMatch(/^power\.loads\.\d+\.supply$/);
  });

  it('deletes a rig with its loads', async () => {
    const created = await fx.agents.owner.post('/api/rigs').send({ name: 'Doomed', householdId: fx.householdId, power: { battery: { chemistry: 'agm', capacityAh: 50 } }, loads: [{ name: 'Lamp', supply: 'dc', watts: 5, hoursPerDay: 3 }] }).expect(201);
    await fx.agents.owner.delete(`/api/rigs/${created.body.id}`).expect(204);
    await fx.agents.owner.get(`/api/rigs/${created.body.id}`).expect(404);
    const loads = await ctx.db.selectFrom('loads').select('id').where('rig_id', '=', created.body.id).execute();
    expect(loads).toHaveLength(0);
  });
});
