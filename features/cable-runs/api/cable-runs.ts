import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { CableRunResult } from '@/shared/energy/wiring';
import type { CableRunInput, CableType, CircuitRoute } from '@/shared/schemas/cable-run';

/** Saved runs sit under the rig's keys (['rigs', ...]), so whatever refreshes a whole rig refreshes them too. */
export const cableRunKeys = { rig: (rigId: string) => ['rigs', 'cable-runs', rigId] as const };

export type SavedCableRun = {
  id: string;
  label: string;
  from: string;
  to: string;
  lengthM: number;
  currentA: number;
  currentFrom: 'entered' | 'load' | 'inverter' | 'missing';
  loadId: string | null;
  inverterLink: boolean;
  loadName: string | null;
  maxDropPercent: number;
  route: CircuitRoute;
  cableType: CableType;
  insulationC: number;
  engineSpace: boolean;
  returnPath: 'cable' | 'chassis';
  continuous: boolean;
  purpose: 'general' | 'inverter';
  existingAwg: string | null;
  existingMm2: number | null;
  sizing: CableRunResult | null;
  warnings: string[];
};

export const useCableRunsQuery = (rigId: string) =>
  useQuery({ queryKey: cableRunKeys.rig(rigId), queryFn: () => apiFetch<{ cableRuns: SavedCableRun[] }>(`/api/rigs/${rigId}/cable-runs`).then((r) => r.cableRuns) });

function useRunMutation<V>(rigId: string, fn: (v: V) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: cableRunKeys.rig(rigId) }) });
}

export const useCableRunCreateMutation = (rigId: string) => useRunMutation(rigId, (run: CableRunInput) => apiFetch(`/api/rigs/${rigId}/cable-runs`, { method: 'POST', json: run }));
export const useCableRunUpdateMutation = (rigId: string) =>
  useRunMutation(rigId, ({ id, run }: { id: string; run: CableRunInput }) => apiFetch(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'PATCH', json: run }));
export const useCableRunDeleteMutation = (rigId: string) => useRunMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/cable-runs/${id}`, { method: 'DELETE' }));
