import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { EmailPrefs } from '@/shared/schemas/email-prefs';

export const settingsKeys = {
  all: ['settings'] as const,
  emailPrefs: () => [...settingsKeys.all, 'email-prefs'] as const,
  emailFailures: () => [...settingsKeys.all, 'email-failures'] as const,
};

export const useEmailPrefsQuery = () => useQuery({ queryKey: settingsKeys.emailPrefs(), queryFn: () => apiFetch<EmailPrefs & { saved: boolean }>('/api/me/email-prefs') });

export function useEmailPrefsMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (prefs: EmailPrefs) => apiFetch<EmailPrefs & { saved: boolean }>('/api/me/email-prefs', { method: 'PUT', json: prefs }),
    onSuccess: (data) => client.setQueryData(settingsKeys.emailPrefs(), data),
  });
}

export type EmailFailure = { id: string; kind: string; key: string; attempts: number; error: string | null; to: string | null; createdAt: string };
export const useEmailFailuresQuery = (enabled: boolean) =>
  useQuery({ queryKey: settingsKeys.emailFailures(), queryFn: () => apiFetch<{ failures: EmailFailure[] }>('/api/admin/email-failures').then((r) => r.failures), enabled });
