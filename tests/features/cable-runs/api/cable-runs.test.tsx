// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { type CableRunForm, cableRunSchema } from '@/shared/schemas/cable-run';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const runs = api.load(() => import('@/features/cable-runs/api/cable-runs'));
const sizing = api.load(() => import('@/features/cable-runs/api/size-cable-run'));
const client = api.load(() => import('@/lib/api-client'));

const runsScreen = () => ({
  runs: runs.useCableRunsQuery(api.fx.rigId),
  create: runs.useCableRunCreateMutation(api.fx.rigId),
  update: runs.useCableRunUpdateMutation(api.fx.rigId),
  remove: runs.useCableRunDeleteMutation(api.fx.rigId),
});

async function openRuns(person: Person) {
  const screen = api.render(runsScreen, person);
  await waitFor(() => expect(screen.result.current.runs.isSuccess).toBe(true));
  return screen;
}

/** A run as the form hands it to the hook: parsed by the same schema (its defaults filled in). */
const run = (form: CableRunForm) => cableRunSchema.parse(form);
// The NEC Chapter 9 Table 8 worked example (as tests/server/rig-cable-runs.test.ts): 20 A over 7.62 m at 3 % is 4 AWG.
const INVERTER_FEED = { label: 'Inverter feed', to: 'Inverter', lengthM: 7.62, currentA: 20, maxDropPercent: 3, cableType: 'marine' as const, purpose: 'inverter' as const };

describe('cable-run hooks', () => {
  it('saves a run: the runs query is invalidated and refetched with it, sized', async () => {
    const { result, client: qc } = await openRuns('member');
    const before = qc.getQueryState(runs.cableRunKeys.rig(api.fx.rigId))!.dataUpdatedAt;
    const saved = await act(() => result.current.create.mutateAsync(run(INVERTER_FEED)));
    expect(saved.sizing).toMatchObject({ awg: '4' });
    await waitFor(() => expect(result.current.runs.data!.find((r) => r.id === saved.id)).toMatchObject({ label: 'Inverter feed', sizing: { awg: '4' } }));
    const state = qc.getQueryState(runs.cableRunKeys.rig(api.fx.rigId))!;
    expect(state.dataUpdatedAt).toBeGreaterThan(before);
    expect(state.isInvalidated).toBe(false);
  });

  it('changes where a run goes and removes it, the list refetched after each', async () => {
    const { result } = await openRuns('owner');
    const saved = await act(() => result.current.create.mutateAsync(run({ label: 'Starter aux', lengthM: 0.2, currentA: 30, maxDropPercent: 10, route: 'engine-bay', cableType: 'marine' })));
    await act(() => result.current.update.mutateAsync({ id: saved.id, run: run({ label: 'Starter aux', lengthM: 0.2, currentA: 30, maxDropPercent: 10, route: 'under-floor', cableType: 'pvc' }) }));
    await waitFor(() => expect(result.current.runs.data!.find((r) => r.id === saved.id)).toMatchObject({ route: 'under-floor', cableType: 'pvc', engineSpace: false }));
    await act(() => result.current.remove.mutateAsync(saved.id));
    await waitFor(() => expect(result.current.runs.data!.find((r) => r.id === saved.id)).toBeUndefined());
  });

  it('sizes a run without saving it, signed in or not', async () => {
    const { result } = api.render(() => sizing.useCableRunSizeMutation(), null);
    const { label: _label, to: _to, ...feed } = INVERTER_FEED;
    const sized = await act(() => result.current.mutateAsync(feed));
    expect(sized).toMatchObject({ awg: '4', fuseA: 20 });
    await waitFor(() => expect(result.current.data).toEqual(sized));
  });

  it('surfaces refused runs as ApiErrors with status 400 naming the fields', async () => {
    const { result, client: qc } = await openRuns('owner');
    const before = qc.getQueryState(runs.cableRunKeys.rig(api.fx.rigId))!.dataUpdatedAt;
    const bad = { ...run(INVERTER_FEED), route: 'roof', cableType: 'copper' } as unknown as ReturnType<typeof run>;
    const err = await act(() => result.current.create.mutateAsync(bad).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400 });
    expect((err as InstanceType<typeof client.ApiError>).fields.map((f) => f.path)).toEqual(expect.arrayContaining(['route', 'cableType']));
    expect(qc.getQueryState(runs.cableRunKeys.rig(api.fx.rigId))!.dataUpdatedAt).toBe(before);

    const size = api.render(() => sizing.useCableRunSizeMutation(), 'owner');
    const both = await act(() => size.result.current.mutateAsync({ lengthM: 2, maxDropPercent: 3, currentA: 10, inverterW: 600, purpose: 'inverter' }).catch((e: unknown) => e));
    expect(both).toMatchObject({ status: 400, fields: [expect.objectContaining({ path: 'currentA' })] });
  });

  it("refuses the advisor's run with 403 and answers an outsider's list 404", async () => {
    const advisor = await openRuns('advisor');
    const err = await act(() => advisor.result.current.create.mutateAsync(run({ ...INVERTER_FEED, label: 'Not mine to add' })).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 403 });
    expect(advisor.result.current.runs.data!.map((r) => r.label)).not.toContain('Not mine to add');

    const outsider = api.render(() => runs.useCableRunsQuery(api.fx.rigId), 'outsider');
    await waitFor(() => expect(outsider.result.current.isError).toBe(true));
    expect(outsider.result.current.error).toMatchObject({ status: 404 });
  });
});
