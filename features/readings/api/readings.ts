import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { DropVerdict } from '@/shared/energy/drop-verdict';
import { apiFetch } from '@/lib/api-client';
import type { ColumnMapping, ReadingForm, VoltageDropForm } from '@/shared/schemas/reading';

export type Readings = {
  spot: { id: string; at: string; voltageV: number; currentA: number | null; socPercent: number | null; rested: boolean; place: string; note: string; by: string | null }[];
  series: { at: string; voltageV: number; socPercent: number | null; currentA: number | null; rested: boolean }[];
  total: number;
  projected: { at: string; socPercent: number }[];
  uploads: { id: string; fileName: string; rowCount: number; errorCount: number; errors: { line: number; reason: string }[]; by: string | null; createdAt: string }[];
  photos: { id: string; caption: string; fileName: string; by: string | null; createdAt: string; thumbUrl: string }[];
  analysis: {
    drainA: number | null;
    hours: number;
    method: 'soc' | 'current' | null;
    span: { from: string; to: string } | null;
    reason: string | null;
    notes: string[];
    keyOffDrawA: number;
    chemistry: string;
    standby: { measuredA: number; modelA: number; matches: boolean; message: string; causes: string[]; suggestedKeyOffDrawA: number } | null;
  };
};
export type LogPreview = { columns: string[]; sample: string[][]; rows: number; mapping: Partial<ColumnMapping>; remembered: boolean };
export type UploadResult = { upload: { id: string; fileName: string; rowCount: number; errorCount: number }; errors: { line: number; reason: string }[] };
export type DropResult = { dropV: number; dropPercent: number; resistanceOhm: number; expectedDropV: number | null; flagged: boolean; message: string; cableRun: string | null; verdict: DropVerdict | null };

export const readingKeys = { all: ['readings'] as const, rig: (rigId: string) => [...readingKeys.all, rigId] as const };

export const useReadingsQuery = (rigId: string) => useQuery({ queryKey: readingKeys.rig(rigId), queryFn: () => apiFetch<Readings>(`/api/rigs/${rigId}/readings`) });

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

export const useSpotReadingMutation = (rigId: string) => useReadingsMutation(rigId, (r: ReadingForm) => apiFetch(`/api/rigs/${rigId}/readings`, { method: 'POST', json: r }));
export const useSpotReadingDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/readings/${id}`, { method: 'DELETE' }));
export const useLogPreviewMutation = (rigId: string) => useMutation({ mutationFn: (file: File) => apiFetch<LogPreview>(`/api/rigs/${rigId}/uploads/preview`, { method: 'POST', body: form(file) }) });
export const useLogUploadMutation = (rigId: string) =>
  useReadingsMutation(rigId, (v: { file: File; mapping: ColumnMapping; allOrNothing: boolean; rested: boolean }) =>
    apiFetch<UploadResult>(`/api/rigs/${rigId}/uploads`, { method: 'POST', body: form(v.file, { mapping: JSON.stringify(v.mapping), allOrNothing: String(v.allOrNothing), rested: String(v.rested) }) }),
  );
export const useUploadDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/uploads/${id}`, { method: 'DELETE' }));
export const usePhotoUploadMutation = (rigId: string) =>
  useReadingsMutation(rigId, (v: { file: File; caption: string }) => apiFetch<{ id: string }>(`/api/rigs/${rigId}/photos`, { method: 'POST', body: form(v.file, { caption: v.caption }) }));
export const usePhotoDeleteMutation = (rigId: string) => useReadingsMutation(rigId, (id: string) => apiFetch(`/api/rigs/${rigId}/photos/${id}`, { method: 'DELETE' }));
/** A fresh signed address for the full photo (they expire after a few minutes). */
export const openPhoto = (rigId: string, id: string) => apiFetch<{ url: string }>(`/api/rigs/${rigId}/photos/${id}`).then((r) => r.url);
export const useVoltageDropMutation = (rigId: string) => useMutation({ mutationFn: (v: VoltageDropForm) => apiFetch<DropResult>(`/api/rigs/${rigId}/voltage-drop`, { method: 'POST', json: v }) });
