import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { NoteCreateForm } from '@/shared/schemas/note';

export type Note = {
  id: string;
  parentId: string | null;
  targetKind: 'rig' | 'load' | 'cable-run' | 'reading';
  targetId: string | null;
  targetName: string | null;
  author: { id: string; name: string } | null;
  body: string;
  rigVersion: number;
  writtenWhen: string | null;
  resolved: boolean;
  edited: boolean;
  createdAt: string;
  mine: boolean;
};
export type Thread = Note & { replies: Note[] };
export type Notes = { threads: Thread[]; unread: number };

export const noteKeys = {
  all: ['notes'] as const,
  rig: (rigId: string) => [...noteKeys.all, rigId] as const,
};

export const notesQueryOptions = (rigId: string) => queryOptions({ queryKey: noteKeys.rig(rigId), queryFn: () => apiFetch<Notes>(`/api/rigs/${rigId}/notes`) });
export const useNotesQuery = (rigId: string) => useQuery(notesQueryOptions(rigId));

function useNoteMutation<V>(rigId: string, fn: (v: V) => Promise<unknown>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: noteKeys.rig(rigId) }) });
}

export const useNoteCreateMutation = (rigId: string) => useNoteMutation(rigId, (form: NoteCreateForm) => apiFetch<{ id: string }>(`/api/rigs/${rigId}/notes`, { method: 'POST', json: form }));
export const useNoteEditMutation = (rigId: string) =>
  useNoteMutation(rigId, ({ id, body }: { id: string; body: string }) => apiFetch(`/api/rigs/${rigId}/notes/${id}`, { method: 'PATCH', json: { body } }));
export const useNoteDeleteMutation = (rigId: string) => useNoteMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/notes/${id}`, { method: 'DELETE' }));
export const useThreadResolveMutation = (rigId: string) =>
  useNoteMutation(rigId, ({ id, resolved }: { id: string; resolved: boolean }) => apiFetch(`/api/rigs/${rigId}/notes/${id}/${resolved ? 'resolve' : 'reopen'}`, { method: 'POST', json: {} }));
/** Marks the rig's notes read for me (the unread count goes to 0). */
export const useNotesReadMutation = (rigId: string) => useNoteMutation(rigId, () => apiFetch(`/api/rigs/${rigId}/notes/read`, { method: 'POST', json: {} }));
