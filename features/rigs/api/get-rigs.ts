import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { RigList } from '@/shared/api/rigs';
import { rigKeys } from './rig-keys';

export type { RigSummary } from '@/shared/api/rigs';

export const getRigs = () => apiFetch<RigList>('/api/rigs').then((r) => r.rigs);

export const rigsQueryOptions = () => queryOptions({ queryKey: rigKeys.list(), queryFn: getRigs });

export const useRigsQuery = () => useQuery(rigsQueryOptions());
