import { useQuery } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { SentEmailList } from '@/shared/api/reports';
import { rigKeys } from './rig-keys';

export type { SentEmail } from '@/shared/api/reports';

export const useSentEmailsQuery = (rigId: string) =>
  useQuery({ queryKey: rigKeys.emails(rigId), queryFn: () => apiFetch<SentEmailList>(`/api/rigs/${rigId}/emails`).then((r) => r.emails) });
