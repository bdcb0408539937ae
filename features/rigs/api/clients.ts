import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { ClientList } from '@/shared/api/rigs';
import { rigKeys } from './rig-keys';

export type { Client } from '@/shared/api/rigs';

/** The rigs shared with me as an advisor, Short first (the server orders them). */
export const useClientsQuery = () => useQuery({ queryKey: rigKeys.clients(), queryFn: () => apiFetch<ClientList>('/api/clients').then((r) => r.clients) });
