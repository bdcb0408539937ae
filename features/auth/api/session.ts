import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { ApiError, apiFetch } from '@/lib/api-client';
import { clearOfflineAnswers } from '@/lib/offline';
import type { Me } from '@/shared/api/me';

export type { Me } from '@/shared/api/me';

export const sessionKeys = { all: ['session'] as const, me: () => [...sessionKeys.all, 'me'] as const };

/** The signed-in account, or null when nobody is signed in. */
export async function getMe(): Promise<Me | null> {
  try {
    return await apiFetch<Me>('/api/me');
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const meQueryOptions = () => queryOptions({ queryKey: sessionKeys.me(), queryFn: getMe, staleTime: 60_000 });

export const useMeQuery = () => useQuery(meQueryOptions());

export function useSignOutMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch('/api/auth/sign-out', { method: 'POST', json: {} }),
    // Even when the request could not go out (offline), this device forgets the account's figures.
    onSettled: async () => {
      client.clear();
      await clearOfflineAnswers();
    },
  });
}
