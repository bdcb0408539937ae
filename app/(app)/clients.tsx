import { useRouter } from 'expo-router';

import { ClientsScreen } from '@/features/rigs/components/clients-screen';
import { RigNotes } from './rigs/[rigId]/notes';

export default function Clients() {
  const router = useRouter();
  return <ClientsScreen onOpen={(rigId) => router.push({ pathname: '/rigs/[rigId]/notes', params: { rigId } })} renderNotes={(rigId) => <RigNotes rigId={rigId} />} />;
}
