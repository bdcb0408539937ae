import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { ApiError, apiFetch } from '@/lib/api-client';
import type { SavedLoad } from '@/shared/api/loads';
import type { Outlook, Rig, RigVersion, TryAnswer } from '@/shared/api/rigs';
import type { LoadInput } from '@/shared/schemas/projection';
import type { RigUpdateForm } from '@/shared/schemas/rig';
import type { TryResult } from '../utils/try-on-device';
import { rigKeys } from './rig-keys';

export type { SavedLoad } from '@/shared/api/loads';
export type { Outlook, Rig, TripOutlookAnswer } from '@/shared/api/rigs';

// A refusal (404: not there or not shared) is an answer, not a failure worth retrying.
const retryUnlessRefused = (count: number, err: Error) => !(err instanceof ApiError && err.status < 500) && count < 1;
export const rigQueryOptions = (rigId: string) => queryOptions({ queryKey: rigKeys.detail(rigId), queryFn: () => apiFetch<Rig>(`/api/rigs/${rigId}`), retry: retryUnlessRefused });
export const useRigQuery = (rigId: string) => useQuery(rigQueryOptions(rigId));

export const outlookQueryOptions = (rigId: string) =>
  queryOptions({ queryKey: rigKeys.outlook(rigId), queryFn: () => apiFetch<Outlook>(`/api/rigs/${rigId}/outlook`) });
export const useOutlookQuery = (rigId: string) => useQuery(outlookQueryOptions(rigId));

/** Every change to a rig (an edit, an applied or undone Fix) invalidates the rig, its Outlook, history, hook-up and the Rigs list. */
export function useRigMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: rigKeys.detail(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.outlook(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.history(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.hookups(rigId) }),
        client.invalidateQueries({ queryKey: rigKeys.list() }),
      ]),
  });
}

export const useRigUpdateMutation = (rigId: string) => useRigMutation(rigId, (form: RigUpdateForm) => apiFetch<RigVersion>(`/api/rigs/${rigId}`, { method: 'PATCH', json: form }));
export const useRigDeleteMutation = (rigId: string) => {
  const client = useQueryClient();
  return useMutation({ mutationFn: () => apiFetch(`/api/rigs/${rigId}`, { method: 'DELETE' }), onSuccess: () => client.invalidateQueries({ queryKey: rigKeys.all }) });
};
export const useLoadCreateMutation = (rigId: string) => useRigMutation(rigId, (load: LoadInput) => apiFetch<SavedLoad>(`/api/rigs/${rigId}/loads`, { method: 'POST', json: load }));
export const useLoadUpdateMutation = (rigId: string) =>
  useRigMutation(rigId, ({ id, load }: { id: string; load: LoadInput }) => apiFetch<SavedLoad>(`/api/rigs/${rigId}/loads/${id}`, { method: 'PATCH', json: load }));
export const useLoadDeleteMutation = (rigId: string) => useRigMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/loads/${id}`, { method: 'DELETE' }));

/** Try a load: the server answers; with no connection, the same model runs here on the last saved rig. */
export const useTryLoadsMutation = (rigId: string) => {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (candidates: LoadInput[]): Promise<TryResult> => {
      try {
        return { ...(await apiFetch<TryAnswer>(`/api/rigs/${rigId}/try`, { method: 'POST', json: { candidates } })), onDevice: false };
      } catch (err) {
        if (!(err instanceof ApiError && err.code === 'offline')) throw err;
        const rig = await client.ensureQueryData(rigQueryOptions(rigId));
        // The model loads only when needed (its own chunk, which the service worker keeps for offline).
        const { tryOnDevice } = await import('../utils/try-on-device');
        return { ...tryOnDevice(rig, candidates), onDevice: true };
      }
    },
  });
};
