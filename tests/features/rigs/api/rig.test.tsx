// @vitest-environment jsdom
import type { QueryClient, QueryKey } from '@tanstack/react-query';
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { rigKeys } from '@/features/rigs/api/rig-keys';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const rig = api.load(() => import('@/features/rigs/api/rig'));
const rigs = api.load(() => import('@/features/rigs/api/get-rigs'));
const history = api.load(() => import('@/features/rigs/api/history'));
const trips = api.load(() => import('@/features/rigs/api/trips'));
const client = api.load(() => import('@/lib/api-client'));

/** The rig workspace's reads and its load and rig writes, as one screen would hold them. */
const workspace = () => ({
  rig: rig.useRigQuery(api.fx.rigId),
  outlook: rig.useOutlookQuery(api.fx.rigId),
  history: history.useHistoryQuery(api.fx.rigId),
  list: rigs.useRigsQuery(),
  trips: trips.useTripsQuery(api.fx.rigId),
  addLoad: rig.useLoadCreateMutation(api.fx.rigId),
  editLoad: rig.useLoadUpdateMutation(api.fx.rigId),
  removeLoad: rig.useLoadDeleteMutation(api.fx.rigId),
  update: rig.useRigUpdateMutation(api.fx.rigId),
});

async function openWorkspace(person: Person) {
  const screen = api.render(workspace, person);
  const r = () => screen.result.current;
  await waitFor(() => expect([r().rig, r().outlook, r().history, r().list, r().trips].every((q) => q.isSuccess)).toBe(true));
  return screen;
}

/** When each query was last fetched, by key. */
const fetchedAt = (qc: QueryClient, keys: QueryKey[]) => keys.map((key) => qc.getQueryState(key)?.dataUpdatedAt ?? 0);
const everyKey = () => [rigKeys.detail(api.fx.rigId), rigKeys.outlook(api.fx.rigId), rigKeys.history(api.fx.rigId), rigKeys.list()];

const LIGHTS = { name: 'Reading lights', supply: 'dc' as const, watts: 6, hoursPerDay: 3 };

describe('rig hooks', () => {
  it("reads the rig, its Outlook and the Rigs list with the viewer's permissions", async () => {
    const { result } = await openWorkspace('member');
    expect(result.current.rig.data).toMatchObject({ id: api.fx.rigId, name: 'Fixture van', role: 'member', permissions: { manageLoads: true, delete: false } });
    expect(result.current.rig.data!.loads.map((l) => l.name)).toContain('Fridge');
    expect(result.current.outlook.data).toMatchObject({ rigId: api.fx.rigId, version: result.current.rig.data!.version });
    expect(result.current.list.data!.map((r) => r.id)).toContain(api.fx.rigId);
  });

  it("adds a load: the rig, its Outlook, history and the Rigs list are refetched, the trips are not", async () => {
    const { result, client: qc } = await openWorkspace('member');
    const before = fetchedAt(qc, everyKey());
    const tripsBefore = qc.getQueryState(rigKeys.trips(api.fx.rigId))!.dataUpdatedAt;
    const { version } = result.current.rig.data!;
    const { consumptionAh } = result.current.outlook.data!.daily;
    const count = result.current.list.data!.find((r) => r.id === api.fx.rigId)!.loadCount;

    await act(() => result.current.addLoad.mutateAsync(LIGHTS));
    await waitFor(() => expect(result.current.rig.data!.loads.map((l) => l.name)).toContain('Reading lights'));
    const after = fetchedAt(qc, everyKey());
    after.forEach((at, i) => expect(at).toBeGreaterThan(before[i]));
    expect(qc.getQueryState(rigKeys.trips(api.fx.rigId))!.dataUpdatedAt).toBe(tripsBefore);

    expect(result.current.rig.data!.version).toBeGreaterThan(version);
    expect(result.current.outlook.data!.version).toBe(result.current.rig.data!.version);
    expect(result.current.outlook.data!.breakdown.map((b) => b.name)).toContain('Reading lights');
    expect(result.current.outlook.data!.daily.consumptionAh).toBeGreaterThan(consumptionAh);
    expect(result.current.history.data![0]).toMatchObject({ kind: 'load-added' });
    expect(result.current.list.data!.find((r) => r.id === api.fx.rigId)!.loadCount).toBe(count + 1);
  });

  it('edits and removes a load, each change in the refetched rig and Outlook', async () => {
    const { result } = await openWorkspace('owner');
    const saved = await act(() => result.current.addLoad.mutateAsync({ ...LIGHTS, name: 'Water pump', watts: 40, hoursPerDay: 0.5 }));
    await waitFor(() => expect(result.current.rig.data!.loads.find((l) => l.id === saved.id)).toBeTruthy());

    await act(() => result.current.editLoad.mutateAsync({ id: saved.id, load: { ...LIGHTS, name: 'Water pump', watts: 60, hoursPerDay: 0.5 } }));
    await waitFor(() => expect(result.current.rig.data!.loads.find((l) => l.id === saved.id)).toMatchObject({ watts: 60 }));
    expect(result.current.history.data![0]).toMatchObject({ kind: 'load-edited' });

    await act(() => result.current.removeLoad.mutateAsync(saved.id));
    await waitFor(() => expect(result.current.rig.data!.loads.find((l) => l.id === saved.id)).toBeUndefined());
    expect(result.current.outlook.data!.breakdown.map((b) => b.name)).not.toContain('Water pump');
    expect(result.current.outlook.data!.version).toBe(result.current.rig.data!.version);
  });

  it('renames the rig; a stale version is refused with 409 and nothing is refetched', async () => {
    const { result, client: qc } = await openWorkspace('owner');
    const { version } = result.current.rig.data!;
    await act(() => result.current.update.mutateAsync({ version, name: 'Fixture van (renamed)' }));
    await waitFor(() => expect(result.current.list.data!.find((r) => r.id === api.fx.rigId)).toMatchObject({ name: 'Fixture van (renamed)' }));
    expect(result.current.rig.data!.name).toBe('Fixture van (renamed)');

    const before = fetchedAt(qc, everyKey());
    const err = await act(() => result.current.update.mutateAsync({ version, name: 'From an old tab' }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 409 });
    expect(fetchedAt(qc, everyKey())).toEqual(before);
    await act(() => result.current.update.mutateAsync({ version: result.current.rig.data!.version, name: 'Fixture van' }));
  });

  it('surfaces a refused load as an ApiError with status 400 naming the field', async () => {
    const { result, client: qc } = await openWorkspace('member');
    const before = fetchedAt(qc, everyKey());
    const err = await act(() => result.current.addLoad.mutateAsync({ ...LIGHTS, watts: -5 }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400, fields: [expect.objectContaining({ path: 'watts' })] });
    await waitFor(() => expect(result.current.addLoad.isError).toBe(true));
    expect(fetchedAt(qc, everyKey())).toEqual(before);
  });

  it("refuses the advisor's load edit with 403 and leaves the rig as it was", async () => {
    const { result } = await openWorkspace('advisor');
    expect(result.current.rig.data!.permissions.manageLoads).toBe(false);
    const fridge = result.current.rig.data!.loads.find((l) => l.name === 'Fridge')!;
    const err = await act(() => result.current.editLoad.mutateAsync({ id: fridge.id, load: { name: 'Fridge', supply: 'dc', watts: 1, hoursPerDay: 1 } }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 403 });
    await waitFor(() => expect(result.current.editLoad.error).toBe(err));
    const again = await openWorkspace('owner');
    expect(again.result.current.rig.data!.loads.find((l) => l.id === fridge.id)).toMatchObject({ watts: fridge.watts, hoursPerDay: fridge.hoursPerDay });
  });

  it("answers an outsider 404 for the rig, once (a refusal is not retried), and leaves it out of the Rigs list", async () => {
    const { result } = api.render(() => ({ rig: rig.useRigQuery(api.fx.rigId), list: rigs.useRigsQuery() }), 'outsider');
    await waitFor(() => expect(result.current.rig.isError && result.current.list.isSuccess).toBe(true));
    expect(result.current.rig.error).toBeInstanceOf(client.ApiError);
    expect(result.current.rig.error).toMatchObject({ status: 404 });
    expect(result.current.rig.failureCount).toBe(1);
    expect(result.current.list.data!.map((r) => r.id)).not.toContain(api.fx.rigId);
  });
});
