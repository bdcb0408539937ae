import { describe, expect, it } from 'vitest';

import { projectTrip } from '@/shared/energy/trip';
import { projectionInputSchema } from '@/shared/schemas/projection';
import { tripSchema } from '@/shared/schemas/trip';
import { withHousehold } from './fixtures';
import { TRIP_PLAN } from './helpers';

const { fx } = withHousehold();

const base = () => `/api/rigs/${fx.rigId}/trips`;

describe('trips on a rig', () => {
  it('lets a member plan a trip and the advisor read it with its recent places', async () => {
    const made = await fx.agents.member.post(base()).send(TRIP_PLAN).expect(201);
    expect(made.body).toMatchObject({ name: 'Lake week', startDate: '2026-06-05', active: true, arrivalHour: 15, batteryInCabin: false });
    expect(made.body.legs[1]).toMatchObject({ kind: 'stay', sky: 'mixed', shore: false });
    const list = await fx.agents.advisor.get(base()).expect(200);
    expect(list.body.trips.map((t: { id: string }) => t.id)).toContain(made.body.id);
    expect(list.body.recentPlaces).toEqual(expect.arrayContaining([{ name: 'Lake', latitudeDeg: 47.5 }, { name: 'Farm', latitudeDeg: 47.1 }]));
  });

  it('keeps one active trip: making another active sets the first aside', async () => {
    const first = (await fx.agents.owner.get(base())).body.trips.find((t: { active: boolean }) => t.active);
    const second = await fx.agents.owner.post(base()).send({ ...TRIP_PLAN, name: 'Second' }).expect(201);
    const list = (await fx.agents.owner.get(base())).body.trips as { id: string; active: boolean }[];
    expect(list.filter((t) => t.active).map((t) => t.id)).toEqual([second.body.id]);
    await fx.agents.owner.put(`${base()}/${first.id}`).send(TRIP_PLAN).expect(200);
    await fx.agents.owner.delete(`${base()}/${second.body.id}`).expect(204);
  });

  it('shows the active trip in the Outlook with the margin at each stay', async () => {
    const res = await fx.agents.advisor.get(`/api/rigs/${fx.rigId}/outlook`).expect(200);
    expect(res.body.trip.name).toBe('Lake week');
    expect(res.body.trip.stays.map((s: { name: string }) => s.name)).toEqual(['Lake', 'Farm']);
    // The same stays as the trip model run directly on the rig as saved and the plan.
    const rig = (await fx.agents.advisor.get(`/api/rigs/${fx.rigId}`).expect(200)).body;
    const loads = rig.loads.map(({ id: _id, addedBy: _by, ...load }: Record<string, unknown>) => load);
    const direct = projectTrip(projectionInputSchema.parse({ ...rig.power, loads }), tripSchema.parse(TRIP_PLAN));
    const figures = (stays: { name: string; marginState: string; socOnArrivalPercent: number; marginDays: number | null }[]) =>
      stays.map((s) => [s.name, s.marginState, s.socOnArrivalPercent, s.marginDays]);
    expect(figures(res.body.trip.stays)).toEqual(figures(direct.stays));
    // The fixture van (100 Ah of AGM, a 45 W fridge at 35 % and an inverter idling all day) lasts about a
    // day parked: five nights at the lake end Short, a margin below zero.
    expect(res.body.trip.stays[0].marginState).toBe('short');
    expect(res.body.trip.stays[0].marginDays).toBeLessThan(0);
    // It reaches the farm below the cut-off; shore power brings it back above it there: Tight, not Short.
    expect(res.body.trip.stays[1].arrivesBelowCutoff).toBe(true);
    expect(res.body.trip.stays[1].marginState).toBe('tight');
    // The farm has shore power all day: it leaves full.
    expect(res.body.trip.stays[1].socOnLeavingPercent).toBe(100);
    // The weekly routine's own figures are still there.
    expect(res.body.parked).toBeDefined();
  });

  it('answers one trip\'s outlook by id, and 404 for a trip of another rig', async () => {
    const trip = (await fx.agents.owner.get(base())).body.trips[0];
    const res = await fx.agents.owner.get(`${base()}/${trip.id}/outlook`).expect(200);
    expect(res.body.series.length).toBe(res.body.stays.length ? 5 + 7 * 24 : 0);
    await fx.agents.owner.get(`${base()}/00000000-0000-4000-8000-000000000000/outlook`).expect(404);
  });

  it('names every wrong field and saves nothing', async () => {
    const before = (await fx.agents.owner.get(base())).body.trips.length;
    const res = await fx.agents.owner
      .post(base())
      .send({ name: '', startDate: '2026-02-30', legs: [{ kind: 'stay', name: 'Lake', latitudeDeg: 120, nights: 0, lowC: 5, highC: 9 }, { kind: 'walk' }] })
      .expect(400);
    const paths = (res.body.fields as { path: string }[]).map((f) => f.path);
    expect(paths).toEqual(expect.arrayContaining(['name', 'startDate', 'legs.0.latitudeDeg', 'legs.0.nights', 'legs.1.kind']));
    expect((await fx.agents.owner.get(base())).body.trips.length).toBe(before);
  });

  it('refuses the advisor a write', async () => {
    await fx.agents.advisor.post(base()).send(TRIP_PLAN).expect(403);
  });
});
