import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { NoteCreated, Notes } from '@/shared/api/notes';
import type { NoteCreateForm } from '@/shared/schemas/note';

export type { Note, Notes, Thread } from '@/shared/api/notes';

export const noteKeys = {
  all: ['notes'] as const,
  rig: (rigId: string) => [...noteKeys.all, rigId] as const,
};

export const notesQueryOptions = (rigId: string) => queryOptions({ queryKey: noteKeys.rig(rigId), queryFn: () => apiFetch<Notes>(`/api/rigs/${rigId}/notes`) });
export const useNotesQuery = (rigId: string) => useQuery(notesQueryOptions(rigId));

function useNoteMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: noteKeys.rig(rigId) }) });
}

export const useNoteCreateMutation = (rigId: string) => useNoteMutation(rigId, (form: NoteCreateForm) => apiFetch<NoteCreated>(`/api/rigs/${rigId}/notes`, { method: 'POST', json: form }));
export const useNoteEditMutation = (rigId: string) =>
  useNoteMutation(rigId, ({ id, body }: { id: string; body: string }) => apiFetch(`/api/rigs/${rigId}/notes/${id}`, { method: 'PATCH', json: { body } }));
export const useNoteDeleteMutation = (rigId: string) => useNoteMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/notes/${id}`, { method: 'DELETE' }));
export const useThreadResolveMutation = (rigId: string) =>
  useNoteMutation(rigId, ({ id, resolved }: { id: string; resolved: boolean }) => apiFetch(`/api/rigs/${rigId}/notes/${id}/${resolved ? 'resolve' : 'reopen'}`, { method: 'POST', json: {} }));
/** Marks the rig's notes read for me (the unread count goes to 0). */
export const useNotesReadMutation = (rigId: string) => useNoteMutation(rigId, () => apiFetch(`/api/rigs/${rigId}/notes/read`, { method: 'POST', json: {} }));
