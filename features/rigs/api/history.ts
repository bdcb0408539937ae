import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { History } from '@/shared/api/reports';
import { rigKeys } from './rig-keys';

export type { HistoryEntry } from '@/shared/api/reports';

export const useHistoryQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.history(rigId), queryFn: () => apiFetch<History>(`/api/rigs/${rigId}/history`).then((r) => r.history) });
