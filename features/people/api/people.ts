import { hashKey, queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { InvitationSent, InvitationView, People } from '@/shared/api/people';
import type { InvitationCreateForm } from '@/shared/schemas/people';

export type { InvitationView, PendingInvitation, People, Person } from '@/shared/api/people';

export const peopleKeys = {
  all: ['people'] as const,
  rig: (rigId: string) => [...peopleKeys.all, rigId] as const,
  invitation: (invitationId: string) => [...peopleKeys.all, 'invitation', invitationId] as const,
};

export const peopleQueryOptions = (rigId: string) =>
  queryOptions({ queryKey: peopleKeys.rig(rigId), queryFn: () => apiFetch<People>(`/api/rigs/${rigId}/people`) });
export const usePeopleQuery = (rigId: string) => useQuery(peopleQueryOptions(rigId));

function usePeopleMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: peopleKeys.rig(rigId) }) });
}

export const useInvitationCreateMutation = (rigId: string) =>
  usePeopleMutation(rigId, (form: InvitationCreateForm) => apiFetch<InvitationSent>(`/api/rigs/${rigId}/invitations`, { method: 'POST', json: form }));
export const useInvitationResendMutation = (rigId: string) =>
  usePeopleMutation(rigId, (id: string) => apiFetch<InvitationSent>(`/api/rigs/${rigId}/invitations/${id}/resend`, { method: 'POST', json: {} }));
export const useInvitationRevokeMutation = (rigId: string) =>
  usePeopleMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/invitations/${id}`, { method: 'DELETE' }));
export const useMemberRoleMutation = (rigId: string) =>
  usePeopleMutation(rigId, ({ memberId, role }: { memberId: string; role: string }) => apiFetch(`/api/rigs/${rigId}/members/${memberId}`, { method: 'PATCH', json: { role } }));
export const useMemberRemoveMutation = (rigId: string) =>
  usePeopleMutation(rigId, (memberId: string) => apiFetch(`/api/rigs/${rigId}/members/${memberId}`, { method: 'DELETE' }));
export const useLeaveMutation = (rigId: string) => useMutation({ mutationFn: () => apiFetch(`/api/rigs/${rigId}/leave`, { method: 'POST', json: {} }) });

export const useInvitationQuery = (invitationId: string) =>
  useQuery({ queryKey: peopleKeys.invitation(invitationId), queryFn: () => apiFetch<InvitationView>(`/api/invitations/${invitationId}`), retry: false });
export function useInvitationAcceptMutation(invitationId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => apiFetch(`/api/invitations/${invitationId}/accept`, { method: 'POST', json: {} }),
    // Joining changes what every screen may read; all but the invitation itself, which, used, would now answer 409
    // and flash "already used" on the screen that is about to move on.
    onSuccess: () => client.invalidateQueries({ predicate: (q) => q.queryHash !== hashKey(peopleKeys.invitation(invitationId)) }),
  });
}
