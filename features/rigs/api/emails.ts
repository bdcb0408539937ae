import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import { rigKeys } from './rig-keys';

export type SentEmail = { id: string; kind: 'report' | 'warning' | 'notes'; subject: string; sentAt: string; recipient: { id: string | null; name: string } };

export const useSentEmailsQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.emails(rigId), queryFn: () => apiFetch<{ emails: SentEmail[] }>(`/api/rigs/${rigId}/emails`).then((r) => r.emails) });
