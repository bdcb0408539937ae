import { useRouter } from 'expo-router';

import { useCableRunsQuery } from '@/features/cable-runs/api/cable-runs';
import { RigNotes } from '@/features/notes/components/rig-notes';
import { useReadingNoteTargets } from '@/features/readings/api/note-targets';
import { useNoteTargets } from '@/features/rigs/api/note-targets';
import { ClientsScreen } from '@/features/rigs/components/clients-screen';

/** A client's Notes, opened inside their row. */
function ClientNotes({ rigId }: { rigId: string }) {
  const runs = useCableRunsQuery(rigId);
  const rig = useNoteTargets(rigId, (runs.data ?? []).map((r) => ({ id: r.id, label: r.label })));
  const readings = useReadingNoteTargets(rigId);
  return <RigNotes rigId={rigId} rig={rig} readings={readings} />;
}

export default function Clients() {
  const router = useRouter();
  return <ClientsScreen onOpen={(rigId) => router.push({ pathname: '/rigs/[rigId]/notes', params: { rigId } })} renderNotes={(rigId) => <ClientNotes rigId={rigId} />} />;
}
