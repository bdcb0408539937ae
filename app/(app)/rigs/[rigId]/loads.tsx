import { useLocalSearchParams } from 'expo-router';

import { LoadsScreen } from '@/features/rigs/components/loads-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <LoadsScreen rigId={rigId} />;
}
