import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { CableRunList, SavedCableRun } from '@/shared/api/cable-runs';
import type { CableRunInput } from '@/shared/schemas/cable-run';

export type { SavedCableRun } from '@/shared/api/cable-runs';

/** Saved runs sit under the rig's keys (['rigs', ...]), so whatever refreshes a whole rig refreshes them too. */
export const cableRunKeys = { rig: (rigId: string) => ['rigs', 'cable-runs', rigId] as const };

export const useCableRunsQuery = (rigId: string) =>
  useQuery({ queryKey: cableRunKeys.rig(rigId), queryFn: () => apiFetch<CableRunList>(`/api/rigs/${rigId}/cable-runs`).then((r) => r.cableRuns) });

function useRunMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: cableRunKeys.rig(rigId) }) });
}

export const useCableRunCreateMutation = (rigId: string) => useRunMutation(rigId, (run: CableRunInput) => apiFetch<SavedCableRun>(`/api/rigs/${rigId}/cable-runs`, { method: 'POST', json: run }));
export const useCableRunUpdateMutation = (rigId: string) =>
  useRunMutation(rigId, ({ id, run }: { id: string; run: CableRunInput }) => apiFetch<SavedCableRun>(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'PATCH', json: run }));
export const useCableRunDeleteMutation = (rigId: string) => useRunMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'DELETE' }));
