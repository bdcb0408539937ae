import { useRouter } from 'expo-router';

import { NewRigScreen } from '@/features/rigs/components/new-rig-screen';

export default function NewRig() {
  const router = useRouter();
  return <NewRigScreen onCreated={(rigId) => router.replace({ pathname: '/rigs/[rigId]', params: { rigId } })} />;
}
