import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useEffect, useRef } from 'react';

import { currentUnits, setUnits } from '@/components/units';
import { apiFetch } from '@/lib/api-client';
import type { EnergyUnit } from '@/shared/units';
import { type Me, sessionKeys } from './session';

/** PUT /api/me/units: the energy unit on the account, which the e-mails follow. */
export function useSaveEnergyUnitMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (energy: EnergyUnit) => apiFetch<Me['units']>('/api/me/units', { method: 'PUT', json: { energy } }),
    onSuccess: (units) => client.setQueryData<Me | null>(sessionKeys.me(), (me) => (me ? { ...me, units } : me)),
  });
}

/**
 * Keeps this device's energy unit and the account's together while signed in. The account's choice wins
 * once it has one (it is what the e-mails say); an account that never chose takes this device's choice,
 * so a unit picked here before the account kept units is not lost.
 */
export function useAccountUnits(me: Me | null | undefined) {
  const save = useSaveEnergyUnitMutation();
  const pushed = useRef<string | null>(null);
  const userId = me?.user.id;
  const energy = me?.units?.energy;
  const saved = me?.units?.saved;
  const { mutate } = save;
  useEffect(() => {
    if (!userId || !energy) return;
    const device = currentUnits();
    if (saved) {
      if (device.energy !== energy) setUnits({ ...device, energy });
    } else if (device.energy !== energy && pushed.current !== userId) {
      pushed.current = userId;
      mutate(device.energy);
    }
  }, [userId, energy, saved, mutate]);
}
