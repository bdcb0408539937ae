import { useLocalSearchParams } from 'expo-router';

import { TryScreen } from '@/features/rigs/components/try-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <TryScreen rigId={rigId} />;
}
