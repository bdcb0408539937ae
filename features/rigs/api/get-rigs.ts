import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { MarginState } from '@/shared/energy/project';
import type { RigHeader } from '@/shared/schemas/rig';
import { rigKeys } from './rig-keys';

/** A rig in the Rigs list: its header and the figures of its card. */
export type RigSummary = RigHeader & {
  loadCount: number;
  daysParked: number | null;
  daysOnRoutine: number | null;
  holds: boolean;
  marginState: MarginState;
  horizonDays: number;
};

export const getRigs = () => apiFetch<{ rigs: RigSummary[] }>('/api/rigs').then((r) => r.rigs);

export const rigsQueryOptions = () => queryOptions({ queryKey: rigKeys.list(), queryFn: getRigs });

export const useRigsQuery = () => useQuery(rigsQueryOptions());
