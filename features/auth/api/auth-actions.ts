import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import { clearOfflineAnswers } from '@/lib/offline';
import type { ForgotPasswordForm, SignInForm, SignUpForm } from '@/shared/schemas/auth';
import { meQueryOptions } from './session';

/** better-auth's own routes under /api/auth, called with the app's fetch wrapper. */
export function useSignInMutation() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (form: SignInForm) => apiFetch('/api/auth/sign-in/email', { method: 'POST', json: form }),
    // The new session is in the cache before the screen navigates, so the guard lets it through. Answers
    // kept for offline from an earlier account on this device (one that never signed out) go first.
    onSuccess: async () => {
      await clearOfflineAnswers();
      return client.fetchQuery({ ...meQueryOptions(), staleTime: 0 });
    },
  });
}

export function useSignUpMutation() {
  return useMutation({
    mutationFn: (form: SignUpForm & { callbackURL: string }) => apiFetch('/api/auth/sign-up/email', { method: 'POST', json: form }),
  });
}

export function useForgotPasswordMutation() {
  return useMutation({
    mutationFn: (form: ForgotPasswordForm & { redirectTo: string }) => apiFetch('/api/auth/request-password-reset', { method: 'POST', json: form }),
  });
}

export function useResetPasswordMutation() {
  return useMutation({
    mutationFn: (body: { newPassword: string; token: string }) => apiFetch('/api/auth/reset-password', { method: 'POST', json: body }),
  });
}

export function useResendVerificationMutation() {
  return useMutation({
    mutationFn: (body: { email: string; callbackURL: string }) => apiFetch('/api/auth/send-verification-email', { method: 'POST', json: body }),
  });
}
