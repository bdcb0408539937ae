import { describe, expect, it } from 'vitest';

import { withHousehold } from './fixtures';

const { fx } = withHousehold();

const base = () => `/api/rigs/${fx.rigId}/cable-runs`;

describe('saved cable runs on a rig', () => {
  it('sizes a run with its own current: 20 A over 7.62 m at 3 % is 4 AWG (NEC Chapter 9 Table 8 worked example)', async () => {
    const res = await fx.agents.member.post(base()).send({ label: 'Inverter feed', to: 'Inverter', lengthM: 7.62, currentA: 20, maxDropPercent: 3, cableType: 'marine', purpose: 'inverter' }).expect(201);
    expect(res.body.sizing).toMatchObject({ awg: '4', dropV: 0.308, fuseA: 20 });
    expect(res.body.sizing.cautions.join(' ')).toMatch(/auto electrician/);
  });

  it("takes a linked load's current: a 48 W fridge at 12 V draws 4 A", async () => {
    const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    const fridge = rig.loads.find((l: { name: string }) => l.name === 'Fridge');
    await fx.agents.owner.patch(`/api/rigs/${fx.rigId}/loads/${fridge.id}`).send({ name: 'Fridge', supply: 'dc', watts: 48, dutyPercent: 35, hoursPerDay: 24 }).expect(200);
    const res = await fx.agents.owner.post(base()).send({ label: 'Fridge feed', lengthM: 4, loadId: fridge.id, maxDropPercent: 3, cableType: 'marine' }).expect(201);
    expect(res.body.currentA).toBe(4);
    expect(res.body.loadName).toBe('Fridge');
    expect(res.body.currentFrom).toBe('load');
  });

  it('keeps where the run goes and its cable type, the fields Wire a circuit asks, and sizes from them', async () => {
    // 33 CFR 183.425 Table 5: 12 AWG at 105 °C carries 45 A, x 0.85 in an engine space = 38.25 A (as tests/shared/circuit.test.ts works it).
    const marine = await fx.agents.owner.post(base()).send({ label: 'Starter aux', lengthM: 0.2, currentA: 30, maxDropPercent: 10, route: 'engine-bay', cableType: 'marine' }).expect(201);
    expect(marine.body).toMatchObject({ route: 'engine-bay', cableType: 'marine', insulationC: 105, engineSpace: true });
    expect(marine.body.sizing).toMatchObject({ awg: '12' });
    expect(marine.body.sizing.ampacityA).toBeCloseTo(38.25, 2);
    const floor = await fx.agents.owner.patch(`${base()}/${marine.body.id}`).send({ label: 'Starter aux', lengthM: 0.2, currentA: 30, maxDropPercent: 10, route: 'under-floor', cableType: 'pvc' }).expect(200);
    expect(floor.body).toMatchObject({ route: 'under-floor', cableType: 'pvc', insulationC: 80, engineSpace: false });
    const listed = (await fx.agents.member.get(base()).expect(200)).body.cableRuns.find((r: { id: string }) => r.id === marine.body.id);
    expect(listed).toMatchObject({ route: 'under-floor', cableType: 'pvc' });
    // Bad words for either are refused by name; the old insulation field is no longer part of a saved run.
    const bad = await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 1, currentA: 5, route: 'roof', cableType: 'copper' }).expect(400);
    expect(bad.body.fields.map((f: { path: string }) => f.path)).toEqual(expect.arrayContaining(['route', 'cableType']));
    await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 1, currentA: 5, insulationC: 105 }).expect(400);
  });

  it('warns where the fitted wire is smaller than the run needs', async () => {
    const res = await fx.agents.owner.post(base()).send({ label: 'Old feed', lengthM: 7.62, currentA: 20, maxDropPercent: 3, cableType: 'marine', existingAwg: '10' }).expect(201);
    expect(res.body.warnings[0]).toBe('The fitted 10 AWG is smaller than the 4 AWG this run needs.');
    const list = await fx.agents.advisor.get(base()).expect(200);
    expect(list.body.cableRuns.map((r: { label: string }) => r.label)).toEqual(expect.arrayContaining(['Inverter feed', 'Fridge feed', 'Old feed']));
  });

  it('refuses a run with neither current nor load, and a load from another rig, naming the field', async () => {
    const none = await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 2, maxDropPercent: 3, cableType: 'marine' }).expect(400);
    expect(none.body.fields[0].path).toBe('currentA');
    const foreign = await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 2, loadId: '00000000-0000-4000-8000-000000000000', maxDropPercent: 3, cableType: 'marine' }).expect(400);
    expect(foreign.body.fields[0].path).toBe('loadId');
    const zero = await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 0, currentA: 0, maxDropPercent: 60, cableType: 'marine' }).expect(400);
    expect(zero.body.fields.map((f: { path: string }) => f.path)).toEqual(expect.arrayContaining(['lengthM', 'currentA', 'maxDropPercent']));
  });

  it('says when no conductor in the table carries the run, without failing the list', async () => {
    await fx.agents.owner.post(base()).send({ label: 'Winch', lengthM: 10, currentA: 900, maxDropPercent: 3, cableType: 'marine' }).expect(201);
    const list = await fx.agents.owner.get(base()).expect(200);
    const winch = list.body.cableRuns.find((r: { label: string }) => r.label === 'Winch');
    expect(winch.sizing).toBeNull();
    expect(winch.warnings[0]).toMatch(/No conductor in the table/);
  });

  it('edits and deletes a run', async () => {
    const created = await fx.agents.owner.post(base()).send({ label: 'Lights', lengthM: 3, currentA: 2, maxDropPercent: 10, cableType: 'marine' }).expect(201);
    const edited = await fx.agents.owner.patch(`${base()}/${created.body.id}`).send({ label: 'Lights', lengthM: 3, currentA: 12, maxDropPercent: 10, cableType: 'marine', continuous: true }).expect(200);
    expect(edited.body.sizing.fuseA).toBe(15); // 125 % of a continuous 12 A (NEC 210.20(A))
    await fx.agents.owner.delete(`${base()}/${created.body.id}`).expect(204);
    await fx.agents.owner.delete(`${base()}/${created.body.id}`).expect(404);
  });

  it("links a run to the rig's inverter and sizes it from its rating", async () => {
    const rig = (await fx.agents.owner.get(`/api/rigs/${fx.rigId}`)).body;
    const inv = rig.power.inverter;
    const res = await fx.agents.owner.post(base()).send({ label: 'Inverter feed', lengthM: 1, inverterLink: true, maxDropPercent: 3, cableType: 'marine' }).expect(201);
    expect(res.body.currentFrom).toBe('inverter');
    // Rated watts at the 10.5 V cut-out through the inverter's efficiency (common practice).
    expect(res.body.currentA).toBeCloseTo(inv.ratedW / (10.5 * (inv.efficiencyPercent / 100)), 2);
    expect(res.body.sizing.basis).toMatchObject({ inverterW: inv.ratedW, continuous: true });
    const both = await fx.agents.owner.post(base()).send({ label: 'X', lengthM: 1, inverterLink: true, currentA: 5, maxDropPercent: 3, cableType: 'marine' }).expect(400);
    expect(both.body.fields[0].path).toBe('currentA');
  });

  it("does not size an AC load's own circuit: it is mains wiring", async () => {
    const ac = (await fx.agents.owner.post(`/api/rigs/${fx.rigId}/loads`).send({ name: 'Laptop', supply: 'ac', watts: 60, hoursPerDay: 2, essential: true }).expect(201)).body;
    expect(ac.essential).toBe(true); // stored with the load (loads.essential)
    const res = await fx.agents.owner.post(base()).send({ label: 'Laptop socket', lengthM: 2, loadId: ac.id, maxDropPercent: 3, cableType: 'marine' }).expect(201);
    expect(res.body.sizing).toBeNull();
    expect(res.body.warnings[0]).toMatch(/mains wiring/);
  });
});
