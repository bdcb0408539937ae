import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { Device } from '@/shared/devices';
import { rigKeys } from './rig-keys';

/** The whole device catalogue, fetched once (about a hundred entries) and searched on the device. */
export const devicesQueryOptions = () =>
  queryOptions({ queryKey: rigKeys.devices(), queryFn: () => apiFetch<{ devices: Device[] }>('/api/devices').then((r) => r.devices), staleTime: Infinity });
export const useDevicesQuery = () => useQuery(devicesQueryOptions());
