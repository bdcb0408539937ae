import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import { rigKeys } from './rig-keys';

export type HistoryEntry = {
  id: string;
  at: string;
  actor: { id: string | null; name: string };
  kind: string;
  summary: string;
  daysParkedBefore: number | null;
  daysParkedAfter: number | null;
  /** An applied Fix the owner can still undo. */
  undoable: boolean;
};

export const useHistoryQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.history(rigId), queryFn: () => apiFetch<{ history: HistoryEntry[] }>(`/api/rigs/${rigId}/history`).then((r) => r.history) });
