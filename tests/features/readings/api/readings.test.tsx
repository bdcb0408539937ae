// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const readings = api.load(() => import('@/features/readings/api/readings'));
const client = api.load(() => import('@/lib/api-client'));

const readingsScreen = () => ({
  readings: readings.useReadingsQuery(api.fx.rigId),
  add: readings.useSpotReadingMutation(api.fx.rigId),
  remove: readings.useSpotReadingDeleteMutation(api.fx.rigId),
  preview: readings.useLogPreviewMutation(api.fx.rigId),
  upload: readings.useLogUploadMutation(api.fx.rigId),
  removeUpload: readings.useUploadDeleteMutation(api.fx.rigId),
  drop: readings.useVoltageDropMutation(api.fx.rigId),
});

async function openReadings(person: Person) {
  const screen = api.render(readingsScreen, person);
  await waitFor(() => expect(screen.result.current.readings.isSuccess).toBe(true));
  return screen;
}

const viewKey = () => readings.readingKeys.view(api.fx.rigId, readings.localTimeZone());
/** A CSV log as a battery monitor writes it, picked in the browser as a File. */
const logFile = () =>
  new File(['Timestamp,Battery (V)\n2026-11-20T06:00:00Z,12.61\nnot a time,12.5\n2026-11-20T07:00:00Z,12.58\n'], 'monitor.csv', { type: 'text/csv' });

describe('readings hooks', () => {
  it('adds a spot reading and deletes it, the Readings view refetched after each', async () => {
    const { result, client: qc } = await openReadings('member');
    const before = qc.getQueryState(viewKey())!.dataUpdatedAt;
    await act(() => result.current.add.mutateAsync({ at: '2026-11-19T08:00:00Z', voltageV: 12.52, rested: true, note: 'Morning, before the fridge.' }));
    await waitFor(() => expect(result.current.readings.data!.spot.find((s) => s.note === 'Morning, before the fridge.')).toMatchObject({ voltageV: 12.52, rested: true, canDelete: true }));
    expect(qc.getQueryState(viewKey())!.dataUpdatedAt).toBeGreaterThan(before);

    const spot = result.current.readings.data!.spot.find((s) => s.note === 'Morning, before the fridge.')!;
    await act(() => result.current.remove.mutateAsync(spot.id));
    await waitFor(() => expect(result.current.readings.data!.spot.map((s) => s.id)).not.toContain(spot.id));
  });

  it('previews and uploads a CSV log picked as a File, sent as multipart; the view then lists it', async () => {
    const { result } = await openReadings('member');
    const preview = await act(() => result.current.preview.mutateAsync(logFile()));
    expect(preview.columns).toEqual(['Timestamp', 'Battery (V)']);

    const done = await act(() =>
      result.current.upload.mutateAsync({ file: logFile(), mapping: { time: 'Timestamp', voltage: 'Battery (V)', currentSign: 'drawn-positive', decimalComma: false }, allOrNothing: false, rested: false }),
    );
    expect(done.upload).toMatchObject({ fileName: 'monitor.csv', rowCount: 2, errorCount: 1 });
    await waitFor(() => expect(result.current.readings.data!.uploads.map((u) => u.id)).toContain(done.upload.id));

    await act(() => result.current.removeUpload.mutateAsync(done.upload.id));
    await waitFor(() => expect(result.current.readings.data!.uploads.map((u) => u.id)).not.toContain(done.upload.id));
  });

  it('works out a drop test without touching the Readings view', async () => {
    const { result, client: qc } = await openReadings('advisor');
    const before = qc.getQueryState(viewKey())!.dataUpdatedAt;
    const drop = await act(() => result.current.drop.mutateAsync({ batteryV: 12.6, pointV: 12.3, currentA: 10 }));
    expect(drop).toMatchObject({ cableRun: null, verdict: null });
    expect(qc.getQueryState(viewKey())!.dataUpdatedAt).toBe(before);
  });

  it('surfaces a refused reading as an ApiError with status 400 naming its fields', async () => {
    const { result, client: qc } = await openReadings('member');
    const before = qc.getQueryState(viewKey())!.dataUpdatedAt;
    const err = await act(() => result.current.add.mutateAsync({ at: 'yesterday', voltageV: 120 }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400 });
    expect((err as InstanceType<typeof client.ApiError>).fields.map((f) => f.path).sort()).toEqual(['at', 'voltageV']);
    expect(qc.getQueryState(viewKey())!.dataUpdatedAt).toBe(before);
  });

  it("refuses the advisor's reading with 403 and answers an outsider 404", async () => {
    const advisor = await openReadings('advisor');
    const err = await act(() => advisor.result.current.add.mutateAsync({ at: '2026-11-19T08:00:00Z', voltageV: 12.5 }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 403 });

    const outsider = api.render(() => readings.useReadingsQuery(api.fx.rigId), 'outsider');
    await waitFor(() => expect(outsider.result.current.isError).toBe(true));
    expect(outsider.result.current.error).toMatchObject({ status: 404 });
  });
});
