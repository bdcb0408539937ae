import { openPhoto, useReadingsQuery } from './readings';

/** The rig's uploaded logs and photos as things a note can be about, and the photos to show beside the notes. */
export function useReadingNoteTargets(rigId: string) {
  const readings = useReadingsQuery(rigId);
  const photos = readings.data?.photos ?? [];
  return {
    targets: [...photos.map((p) => ({ kind: 'reading' as const, id: p.id, name: `Photo: ${p.caption || p.fileName}` })), ...(readings.data?.uploads ?? []).map((u) => ({ kind: 'reading' as const, id: u.id, name: `Log: ${u.fileName}` }))],
    photos: readings.data?.photos,
    openPhoto: (id: string) => void openPhoto(rigId, id).then((url) => globalThis.open?.(url, '_blank', 'noopener')),
  };
}
