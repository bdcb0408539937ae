import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { Health } from '@/shared/schemas/health';

export const healthKeys = { all: ['health'] as const };

export const getHealth = () => apiFetch<Health>('/api/health');

export const healthQueryOptions = () => queryOptions({ queryKey: healthKeys.all, queryFn: getHealth });

export const useHealthQuery = () => useQuery(healthQueryOptions());
