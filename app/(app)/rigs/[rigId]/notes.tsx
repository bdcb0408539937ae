import { useLocalSearchParams } from 'expo-router';

import { useCableRunsQuery } from '@/features/cable-runs/api/cable-runs';
import { RigNotes } from '@/features/notes/components/rig-notes';
import { useReadingNoteTargets } from '@/features/readings/api/note-targets';
import { useNoteTargets } from '@/features/rigs/api/note-targets';

export default function Notes() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const runs = useCableRunsQuery(rigId);
  const rig = useNoteTargets(rigId, (runs.data ?? []).map((r) => ({ id: r.id, label: r.label })));
  const readings = useReadingNoteTargets(rigId);
  return <RigNotes rigId={rigId} rig={rig} readings={readings} />;
}
