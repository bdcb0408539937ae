import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import { apiFetch } from '@/lib/api-client';
import type { DropResult, LogPreview, PhotoAdded, PhotoUrls, ReadingAdded, Readings, UploadResult } from '@/shared/api/readings';
import type { ColumnMapping, ReadingForm, VoltageDropForm } from '@/shared/schemas/reading';

export type { DropResult, LogPreview, Readings, UploadResult } from '@/shared/api/readings';

export const readingKeys = {
  all: ['readings'] as const,
  rig: (rigId: string) => [...readingKeys.all, rigId] as const,
  view: (rigId: string, timeZone: string) => [...readingKeys.rig(rigId), timeZone] as const,
};

/** The viewer's own time zone: the model's schedule hours and a log's times without an offset are read in it. */
export const localTimeZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

export const useReadingsQuery = (rigId: string) => {
  const timeZone = localTimeZone();
  return useQuery({ queryKey: readingKeys.view(rigId, timeZone), queryFn: () => apiFetch<Readings>(`/api/rigs/${rigId}/readings?timeZone=${encodeURIComponent(timeZone)}`) });
};

function useReadingsMutation<V, R>(rigId: string, fn: (v: V) => Promise<R>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: readingKeys.rig(rigId) }) });
}

const form = (file: File, fields: Record<string, string> = {}) => {
  const body = new FormData();
  for (const [k, v] of Object.entries(fields)) body.append(k, v);
  body.append('file', file, file.name);
  return body;
};

export const useSpotReadingMutation = (rigId: string) => useReadingsMutation(rigId, (r: ReadingForm) => apiFetch<ReadingAdded>(`/api/rigs/${rigId}/readings`, { method: 'POST', json: r }));
export const useSpotReadingDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/readings/${id}`, { method: 'DELETE' }));
export const useLogPreviewMutation = (rigId: string) => useMutation({ mutationFn: (file: File) => apiFetch<LogPreview>(`/api/rigs/${rigId}/uploads/preview`, { method: 'POST', body: form(file) }) });
export const useLogUploadMutation = (rigId: string) =>
  useReadingsMutation(rigId, (v: { file: File; mapping: ColumnMapping; allOrNothing: boolean; rested: boolean }) =>
    apiFetch<UploadResult>(`/api/rigs/${rigId}/uploads`, { method: 'POST', body: form(v.file, { mapping: JSON.stringify(v.mapping), allOrNothing: String(v.allOrNothing), rested: String(v.rested), timeZone: localTimeZone() }) }),
  );
export const useUploadDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/uploads/${id}`, { method: 'DELETE' }));
export const usePhotoUploadMutation = (rigId: string) =>
  useReadingsMutation(rigId, (v: { file: File; caption: string }) => apiFetch<PhotoAdded>(`/api/rigs/${rigId}/photos`, { method: 'POST', body: form(v.file, { caption: v.caption }) }));
export const usePhotoDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/photos/${id}`, { method: 'DELETE' }));
/** A fresh signed address for the full photo (they expire after a few minutes). */
export const openPhoto = (rigId: string, id: string) => apiFetch<PhotoUrls>(`/api/rigs/${rigId}/photos/${id}`).then((r) => r.url);
export const useVoltageDropMutation = (rigId: string) => useMutation({ mutationFn: (v: VoltageDropForm) => apiFetch<DropResult>(`/api/rigs/${rigId}/voltage-drop`, { method: 'POST', json: v }) });
