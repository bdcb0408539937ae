import { useLocalSearchParams } from 'expo-router';

import { TripsScreen } from '@/features/rigs/components/trips-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <TripsScreen rigId={rigId} />;
}
