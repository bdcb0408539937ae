import { useRouter } from 'expo-router';

import { RigsScreen } from '@/features/rigs/components/rigs-screen';

export default function Home() {
  const router = useRouter();
  return <RigsScreen onNewRig={() => router.push('/rigs/new')} />;
}
