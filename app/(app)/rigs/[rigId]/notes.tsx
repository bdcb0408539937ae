import { useLocalSearchParams } from 'expo-router';

import { RigNotes } from '@/features/notes/components/rig-notes';
import { useReadingNoteTargets } from '@/features/readings/api/note-targets';
import { useNoteTargets } from '@/features/rigs/api/note-targets';

export default function Notes() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const rig = useNoteTargets(rigId);
  const readings = useReadingNoteTargets(rigId);
  return <RigNotes rigId={rigId} rig={rig} readings={readings} />;
}
