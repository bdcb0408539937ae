import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { RigSummary } from './get-rigs';
import { rigKeys } from './rig-keys';

export type Client = RigSummary & { unreadNotes: number };

/** The rigs shared with me as an advisor, Short first (the server orders them). */
export const useClientsQuery = () => useQuery({ queryKey: rigKeys.clients(), queryFn: () => apiFetch<{ clients: Client[] }>('/api/clients').then((r) => r.clients) });
