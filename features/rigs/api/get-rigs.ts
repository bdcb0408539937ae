import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { MarginState } from '@/shared/energy/project';
import { rigKeys } from './rig-keys';

export type RigSummary = {
  id: string;
  name: string;
  vehicle: string;
  householdId: string;
  householdName: string;
  role: 'owner' | 'member' | 'advisor';
  permissions: { edit: boolean; delete: boolean; manageLoads: boolean; managePeople: boolean; comment: boolean };
  version: number;
  updatedAt: string;
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
