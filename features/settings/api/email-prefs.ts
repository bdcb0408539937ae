import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { EmailFailureList } from '@/shared/api/admin';
import type { SavedEmailPrefs } from '@/shared/api/me';
import type { EmailPrefs } from '@/shared/schemas/email-prefs';

export const settingsKeys = {
  all: ['settings'] as const,
  emailPrefs: () => [...settingsKeys.all, 'email-prefs'] as const,
  emailFailures: () => [...settingsKeys.all, 'email-failures'] as const,
};

export const useEmailPrefsQuery = () => useQuery({ queryKey: settingsKeys.emailPrefs(), queryFn: () => apiFetch<SavedEmailPrefs>('/api/me/email-prefs') });

export function useEmailPrefsMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (prefs: EmailPrefs) => apiFetch<SavedEmailPrefs>('/api/me/email-prefs', { method: 'PUT', json: prefs }),
    onSuccess: (data) => client.setQueryData(settingsKeys.emailPrefs(), data),
  });
}

export type { EmailFailure } from '@/shared/api/admin';
export const useEmailFailuresQuery = (enabled: boolean) =>
  useQuery({ queryKey: settingsKeys.emailFailures(), queryFn: () => apiFetch<EmailFailureList>('/api/admin/email-failures').then((r) => r.failures), enabled });
