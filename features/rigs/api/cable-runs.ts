import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { CableRunList, SavedCableRun } from '@/shared/api/cable-runs';
import type { CableRunInput } from '@/shared/schemas/cable-run';
import { rigKeys } from './rig-keys';

export type { SavedCableRun } from '@/shared/api/cable-runs';

export const useCableRunsQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.cableRuns(rigId), queryFn: () => apiFetch<CableRunList>(`/api/rigs/${rigId}/cable-runs`).then((r) => r.cableRuns) });

function useRunMutation<V>(rigId: string, fn: (v: V) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: rigKeys.cableRuns(rigId) }) });
}

export const useCableRunCreateMutation = (rigId: string) => useRunMutation(rigId, (run: CableRunInput) => apiFetch<SavedCableRun>(`/api/rigs/${rigId}/cable-runs`, { method: 'POST', json: run }));
export const useCableRunUpdateMutation = (rigId: string) =>
  useRunMutation(rigId, ({ id, run }: { id: string; run: CableRunInput }) => apiFetch<SavedCableRun>(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'PATCH', json: run }));
export const useCableRunDeleteMutation = (rigId: string) => useRunMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'DELETE' }));
