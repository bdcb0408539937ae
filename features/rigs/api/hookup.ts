import { queryOptions, useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { RigHookup } from '@/shared/api/hookups';
import type { InverterControl } from '@/shared/schemas/projection';
import { rigKeys } from './rig-keys';

export type { RigHookup } from '@/shared/api/hookups';

/** The rig's hook-up as it is, or (control given) as a Fix would change the inverter's control. */
export const hookupQueryOptions = (rigId: string, control: InverterControl | null) =>
  queryOptions({
    queryKey: rigKeys.hookup(rigId, control),
    queryFn: () => apiFetch<RigHookup>(`/api/rigs/${rigId}/hookup${control ? `?control=${control}` : ''}`),
  });
export const useHookupQuery = (rigId: string, control: InverterControl | null, enabled = true) => useQuery({ ...hookupQueryOptions(rigId, control), enabled });
