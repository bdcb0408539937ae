import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator } from 'react-native';

import { useCableRunsQuery } from '@/features/cable-runs/api/cable-runs';
import { NotesPanel } from '@/features/notes/components/notes-panel';
import { openPhoto, useReadingsQuery } from '@/features/readings/api/readings';
import { useNoteTargets } from '@/features/rigs/api/note-targets';

/** The rig's Notes, about the rig, a load, a cable run or an uploaded log or photo, with the photos beside them. */
export function RigNotes({ rigId }: { rigId: string }) {
  const runs = useCableRunsQuery(rigId);
  const t = useNoteTargets(rigId, (runs.data ?? []).map((r) => ({ id: r.id, label: r.label })));
  const readings = useReadingsQuery(rigId);
  if (!t.ready) return <ActivityIndicator />;
  const uploads = [...(readings.data?.photos ?? []).map((p) => ({ kind: 'reading' as const, id: p.id, name: `Photo: ${p.caption || p.fileName}` })), ...(readings.data?.uploads ?? []).map((u) => ({ kind: 'reading' as const, id: u.id, name: `Log: ${u.fileName}` }))];
  return (
    <NotesPanel
      rigId={rigId}
      canComment={t.canComment}
      canDeleteAny={t.canDeleteAny}
      targets={[...t.targets, ...uploads]}
      photos={readings.data?.photos}
      onOpenPhoto={(id) => void openPhoto(rigId, id).then((url) => globalThis.open?.(url, '_blank', 'noopener'))}
    />
  );
}

export default function Notes() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <RigNotes rigId={rigId} />;
}
