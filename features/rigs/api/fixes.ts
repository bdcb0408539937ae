import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { FixKind, MarginState, Warning } from '@/shared/energy/project';
import { rigKeys } from './rig-keys';

export type FixSide = { daysParked: number | null; daysOnRoutine: number | null; routineHolds: boolean; dailyAh: number; netAh: number; marginDays: number | null; marginState: MarginState };
export type FixPreview = { kind: FixKind; summary: string; convenience: string; before: FixSide; after: FixSide; warnings: Warning[] };

export const useFixPreviewMutation = (rigId: string) =>
  useMutation({ mutationFn: (kind: FixKind) => apiFetch<FixPreview>(`/api/rigs/${rigId}/fixes/preview`, { method: 'POST', json: { kind } }) });

/** Applying or undoing a Fix changes the rig: its Outlook, hook-up, history and the Rigs list move with it. */
function useFixChange<V>(rigId: string, fn: (v: V) => Promise<unknown>) {
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

export const useFixApplyMutation = (rigId: string) =>
  useFixChange(rigId, (v: { kind: FixKind; version: number }) => apiFetch(`/api/rigs/${rigId}/fixes/apply`, { method: 'POST', json: v }));
export const useFixUndoMutation = (rigId: string) => useFixChange(rigId, (entryId: string) => apiFetch(`/api/rigs/${rigId}/history/${entryId}/undo`, { method: 'POST' }));
