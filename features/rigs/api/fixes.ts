import { useMutation } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { FixPreview } from '@/shared/api/fixes';
import type { RigVersion } from '@/shared/api/rigs';
import type { FixKind } from '@/shared/energy/project';
import { useRigMutation } from './rig';

export type { FixPreview, FixSide } from '@/shared/api/fixes';

export const useFixPreviewMutation = (rigId: string) =>
  useMutation({ mutationFn: (kind: FixKind) => apiFetch<FixPreview>(`/api/rigs/${rigId}/fixes/preview`, { method: 'POST', json: { kind } }) });

export const useFixApplyMutation = (rigId: string) =>
  useRigMutation(rigId, (v: { kind: FixKind; version: number }) => apiFetch<RigVersion>(`/api/rigs/${rigId}/fixes/apply`, { method: 'POST', json: v }));
export const useFixUndoMutation = (rigId: string) => useRigMutation(rigId, (entryId: string) => apiFetch<RigVersion>(`/api/rigs/${rigId}/history/${entryId}/undo`, { method: 'POST' }));
