import { useMutation } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { FixKind, MarginState, Warning } from '@/shared/energy/project';
import { useRigMutation } from './rig';

export type FixSide = { daysParked: number | null; daysOnRoutine: number | null; routineHolds: boolean; dailyAh: number; netAh: number; marginDays: number | null; marginState: MarginState };
export type FixPreview = { kind: FixKind; summary: string; convenience: string; before: FixSide; after: FixSide; warnings: Warning[] };

export const useFixPreviewMutation = (rigId: string) =>
  useMutation({ mutationFn: (kind: FixKind) => apiFetch<FixPreview>(`/api/rigs/${rigId}/fixes/preview`, { method: 'POST', json: { kind } }) });

export const useFixApplyMutation = (rigId: string) =>
  useRigMutation(rigId, (v: { kind: FixKind; version: number }) => apiFetch(`/api/rigs/${rigId}/fixes/apply`, { method: 'POST', json: v }));
export const useFixUndoMutation = (rigId: string) => useRigMutation(rigId, (entryId: string) => apiFetch(`/api/rigs/${rigId}/history/${entryId}/undo`, { method: 'POST' }));
