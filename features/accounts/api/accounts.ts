import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { AccountList, AccountRole } from '@/shared/api/admin';

export type { Account, AccountRole } from '@/shared/api/admin';

export const accountKeys = { all: ['accounts'] as const, list: () => [...accountKeys.all, 'list'] as const };

export const accountsQueryOptions = () => queryOptions({ queryKey: accountKeys.list(), queryFn: () => apiFetch<AccountList>('/api/admin/users').then((r) => r.users) });
export const useAccountsQuery = () => useQuery(accountsQueryOptions());

export function useAccountRoleMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, role }: { userId: string; role: AccountRole }) => apiFetch(`/api/admin/users/${encodeURIComponent(userId)}/role`, { method: 'PUT', json: { role } }),
    onSuccess: () => client.invalidateQueries({ queryKey: accountKeys.all }),
  });
}
