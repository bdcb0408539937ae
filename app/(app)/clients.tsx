import { useRouter } from 'expo-router';
import { ActivityIndicator } from 'react-native';

import { NotesPanel } from '@/features/notes/components/notes-panel';
import { useNoteTargets } from '@/features/rigs/api/note-targets';
import { ClientsScreen } from '@/features/rigs/components/clients-screen';

function ClientNotes({ rigId }: { rigId: string }) {
  const t = useNoteTargets(rigId);
  if (!t.ready) return <ActivityIndicator />;
  return <NotesPanel rigId={rigId} canComment={t.canComment} canDeleteAny={t.canDeleteAny} targets={t.targets} />;
}

export default function Clients() {
  const router = useRouter();
  return <ClientsScreen onOpen={(rigId) => router.push({ pathname: '/rigs/[rigId]/notes', params: { rigId } })} renderNotes={(rigId) => <ClientNotes rigId={rigId} />} />;
}
