// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { rigKeys } from '@/features/rigs/api/rig-keys';
import type { TripInput } from '@/shared/schemas/trip';
import { TRIP_PLAN } from '../../../server/helpers';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const rig = api.load(() => import('@/features/rigs/api/rig'));
const trips = api.load(() => import('@/features/rigs/api/trips'));
const client = api.load(() => import('@/lib/api-client'));

const PLAN = TRIP_PLAN as TripInput;

const tripsScreen = () => ({
  trips: trips.useTripsQuery(api.fx.rigId),
  outlook: rig.useOutlookQuery(api.fx.rigId),
  rig: rig.useRigQuery(api.fx.rigId),
  create: trips.useTripCreateMutation(api.fx.rigId),
  update: trips.useTripUpdateMutation(api.fx.rigId),
  remove: trips.useTripDeleteMutation(api.fx.rigId),
});

async function openTrips(person: Person) {
  const screen = api.render(tripsScreen, person);
  await waitFor(() => expect([screen.result.current.trips, screen.result.current.outlook, screen.result.current.rig].every((q) => q.isSuccess)).toBe(true));
  return screen;
}

describe('trip hooks', () => {
  it("plans an active trip: the trips and the rig's Outlook are refetched, and the Outlook follows the trip", async () => {
    const { result, client: qc } = await openTrips('member');
    expect(result.current.outlook.data!.trip).toBeNull();
    const keys = [rigKeys.trips(api.fx.rigId), rigKeys.outlook(api.fx.rigId), rigKeys.detail(api.fx.rigId)];
    const before = keys.map((k) => qc.getQueryState(k)!.dataUpdatedAt);

    const saved = await act(() => result.current.create.mutateAsync(PLAN));
    await waitFor(() => expect(result.current.trips.data!.trips.map((t) => t.id)).toContain(saved.id));
    keys.forEach((k, i) => expect(qc.getQueryState(k)!.dataUpdatedAt).toBeGreaterThan(before[i]));
    expect(result.current.outlook.data!.trip).toMatchObject({ tripId: saved.id, name: 'Lake week' });
    expect(result.current.trips.data!.recentPlaces.map((p) => p.name)).toEqual(expect.arrayContaining(['Lake', 'Farm']));

    const outlook = api.render(() => trips.useTripOutlookQuery(api.fx.rigId, saved.id), 'member');
    await waitFor(() => expect(outlook.result.current.isSuccess).toBe(true));
    expect(outlook.result.current.data).toMatchObject({ tripId: saved.id, name: 'Lake week' });
  });

  it('renames a trip, then deletes it; the Outlook has no trip again', async () => {
    const { result } = await openTrips('owner');
    const trip = result.current.trips.data!.trips[0];
    await act(() => result.current.update.mutateAsync({ id: trip.id, trip: { ...PLAN, name: 'Lake week, longer' } }));
    await waitFor(() => expect(result.current.outlook.data!.trip).toMatchObject({ name: 'Lake week, longer' }));
    await act(() => result.current.remove.mutateAsync(trip.id));
    await waitFor(() => expect(result.current.trips.data!.trips).toHaveLength(0));
    expect(result.current.outlook.data!.trip).toBeNull();
  });

  it('surfaces a refused trip as an ApiError with status 400 naming the field; the advisor is refused 403', async () => {
    const { result } = await openTrips('member');
    const err = await act(() => result.current.create.mutateAsync({ ...PLAN, startDate: 'soon' }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400 });
    expect(new Set((err as InstanceType<typeof client.ApiError>).fields.map((f) => f.path))).toEqual(new Set(['startDate']));

    const advisor = await openTrips('advisor');
    const refused = await act(() => advisor.result.current.create.mutateAsync(PLAN).catch((e: unknown) => e));
    expect(refused).toBeInstanceOf(client.ApiError);
    expect(refused).toMatchObject({ status: 403 });
    expect(advisor.result.current.trips.data!.trips).toHaveLength(0);
  });
});
