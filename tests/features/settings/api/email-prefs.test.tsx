// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { DEFAULT_EMAIL_PREFS } from '@/shared/schemas/email-prefs';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const settings = api.load(() => import('@/features/settings/api/email-prefs'));
const client = api.load(() => import('@/lib/api-client'));

async function openPrefs(person: Person) {
  const screen = api.render(() => ({ prefs: settings.useEmailPrefsQuery(), save: settings.useEmailPrefsMutation() }), person);
  await waitFor(() => expect(screen.result.current.prefs.isSuccess).toBe(true));
  return screen;
}

describe('e-mail preference hooks', () => {
  it('reads the defaults until saved; a save puts the answer in the cache without a refetch, and a fresh client reads it back', async () => {
    const { result, client: qc } = await openPrefs('member');
    expect(result.current.prefs.data).toEqual({ ...DEFAULT_EMAIL_PREFS, saved: false });
    const fetched = qc.getQueryState(settings.settingsKeys.emailPrefs())!.dataUpdatedAt;

    const prefs = { ...DEFAULT_EMAIL_PREFS, reportWeekday: 4, reportHour: 7, timeZone: 'Europe/Lisbon', warnAt: 'short' as const, noteEmailsOn: false };
    const saved = await act(() => result.current.save.mutateAsync(prefs));
    expect(saved).toEqual({ ...prefs, saved: true });
    await waitFor(() => expect(result.current.prefs.data).toEqual({ ...prefs, saved: true }));
    const state = qc.getQueryState(settings.settingsKeys.emailPrefs())!;
    expect(state.dataUpdateCount).toBe(2);
    expect(state.dataUpdatedAt).toBeGreaterThanOrEqual(fetched);
    expect(state.isInvalidated).toBe(false);

    const other = await openPrefs('member');
    expect(other.client).not.toBe(qc);
    expect(other.result.current.prefs.data).toEqual({ ...prefs, saved: true });
    const owner = await openPrefs('owner');
    expect(owner.result.current.prefs.data!.saved).toBe(false);
  });

  it('surfaces refused preferences as an ApiError with status 400 naming the fields, and keeps the cached ones', async () => {
    const { result, client: qc } = await openPrefs('owner');
    const cached = qc.getQueryData(settings.settingsKeys.emailPrefs());
    const err = await act(() => result.current.save.mutateAsync({ ...DEFAULT_EMAIL_PREFS, reportHour: 24, timeZone: 'Mars/Olympus' }).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400 });
    expect((err as InstanceType<typeof client.ApiError>).fields.map((f) => f.path).sort()).toEqual(['reportHour', 'timeZone']);
    expect(qc.getQueryData(settings.settingsKeys.emailPrefs())).toBe(cached);
  });

  it('lets an admin read the failed e-mails; anyone else is refused 403; signed out, 401', async () => {
    const admin = api.render(() => settings.useEmailFailuresQuery(true), 'admin');
    await waitFor(() => expect(admin.result.current.isSuccess).toBe(true));
    expect(Array.isArray(admin.result.current.data)).toBe(true);

    const owner = api.render(() => settings.useEmailFailuresQuery(true), 'owner');
    await waitFor(() => expect(owner.result.current.isError).toBe(true));
    expect(owner.result.current.error).toBeInstanceOf(client.ApiError);
    expect(owner.result.current.error).toMatchObject({ status: 403 });

    const off = api.render(() => settings.useEmailFailuresQuery(false), 'owner');
    expect(off.result.current.fetchStatus).toBe('idle');
    expect(off.client.getQueryState(settings.settingsKeys.emailFailures())?.dataUpdatedAt ?? 0).toBe(0);

    const anonymous = api.render(() => settings.useEmailPrefsQuery(), null);
    await waitFor(() => expect(anonymous.result.current.isError).toBe(true));
    expect(anonymous.result.current.error).toMatchObject({ status: 401 });
  });
});
