import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator } from 'react-native';

import { NotesPanel } from '@/features/notes/components/notes-panel';
import { useNoteTargets } from '@/features/rigs/api/note-targets';

export default function Notes() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const t = useNoteTargets(rigId);
  if (!t.ready) return <ActivityIndicator />;
  return <NotesPanel rigId={rigId} canComment={t.canComment} canDeleteAny={t.canDeleteAny} targets={t.targets} />;
}
