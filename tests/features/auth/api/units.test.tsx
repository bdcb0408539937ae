// @vitest-environment jsdom
import { act, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';

import { DEFAULT_UNITS, currentUnits, setUnits } from '@/components/units';
import type { EnergyUnit } from '@/shared/units';
import { type Person, withApiHooks } from '../../harness';

const api = withApiHooks();
const session = api.load(() => import('@/features/auth/api/session'));
const units = api.load(() => import('@/features/auth/api/units'));
const client = api.load(() => import('@/lib/api-client'));

async function openAccount(person: Person) {
  const screen = api.render(() => ({ me: session.useMeQuery(), save: units.useSaveEnergyUnitMutation() }), person);
  await waitFor(() => expect(screen.result.current.me.isSuccess).toBe(true));
  return screen;
}

/** The app shell: the session, and the device's unit kept with the account's. */
function useShell() {
  const me = session.useMeQuery();
  units.useAccountUnits(me.data);
  return me;
}

const unitsOf = async (person: Person) => (await openAccount(person)).result.current.me.data!.units;

describe('session and unit hooks', () => {
  it('reads who is signed in, and null for nobody', async () => {
    const { result } = await openAccount('owner');
    expect(result.current.me.data!.user).toMatchObject({ id: api.fx.users.owner.id, email: api.fx.users.owner.email });
    expect(result.current.me.data!.households.map((h) => h.id)).toContain(api.fx.householdId);
    expect(result.current.me.data!.units).toEqual({ energy: 'Ah', saved: false });

    const anonymous = api.render(() => session.useMeQuery(), null);
    await waitFor(() => expect(anonymous.result.current.isSuccess).toBe(true));
    expect(anonymous.result.current.data).toBeNull();
  });

  it("saves the account's energy unit into the cached session, and a fresh client reads it back", async () => {
    const { result, client: qc } = await openAccount('owner');
    const saved = await act(() => result.current.save.mutateAsync('Wh'));
    expect(saved).toEqual({ energy: 'Wh', saved: true });
    await waitFor(() => expect(result.current.me.data!.units).toEqual({ energy: 'Wh', saved: true }));
    expect(qc.getQueryData<{ units: unknown }>(session.sessionKeys.me())!.units).toEqual({ energy: 'Wh', saved: true });
    expect(await unitsOf('owner')).toEqual({ energy: 'Wh', saved: true });
  });

  it('surfaces a refused unit as an ApiError with status 400 naming the field', async () => {
    const { result, client: qc } = await openAccount('owner');
    const cached = qc.getQueryData(session.sessionKeys.me());
    const err = await act(() => result.current.save.mutateAsync('kWh' as EnergyUnit).catch((e: unknown) => e));
    expect(err).toBeInstanceOf(client.ApiError);
    expect(err).toMatchObject({ status: 400, fields: [expect.objectContaining({ path: 'energy' })] });
    expect(qc.getQueryData(session.sessionKeys.me())).toBe(cached);
  });

  it("gives an account that never chose this device's unit", async () => {
    setUnits({ ...DEFAULT_UNITS, energy: 'Wh' });
    expect(await unitsOf('member')).toEqual({ energy: 'Ah', saved: false });
    const { result } = api.render(useShell, 'member');
    await waitFor(() => expect(result.current.data?.units).toEqual({ energy: 'Wh', saved: true }));
    expect(await unitsOf('member')).toEqual({ energy: 'Wh', saved: true });
  });

  it("lets the account's saved unit win over this device's", async () => {
    const advisor = await openAccount('advisor');
    await act(() => advisor.result.current.save.mutateAsync('Ah'));
    setUnits({ ...DEFAULT_UNITS, energy: 'Wh' });
    const { result } = api.render(useShell, 'advisor');
    await waitFor(() => expect(result.current.isSuccess).toBe(true));
    await waitFor(() => expect(currentUnits().energy).toBe('Ah'));
    expect(await unitsOf('advisor')).toEqual({ energy: 'Ah', saved: true });
  });

  it("signs out: this client forgets everything and the person's session is gone, until they sign in again", async () => {
    const screen = api.render(() => ({ me: session.useMeQuery(), signOut: session.useSignOutMutation() }), 'outsider');
    await waitFor(() => expect(screen.result.current.me.data?.user.id).toBe(api.fx.users.outsider.id));
    await act(() => screen.result.current.signOut.mutateAsync());
    expect(screen.client.getQueryData(session.sessionKeys.me())).toBeUndefined();

    const after = api.render(() => session.useMeQuery(), 'outsider');
    await waitFor(() => expect(after.result.current.isSuccess).toBe(true));
    expect(after.result.current.data).toBeNull();

    await api.signIn('outsider');
    expect((await openAccount('outsider')).result.current.me.data!.user.id).toBe(api.fx.users.outsider.id);
  });
});
