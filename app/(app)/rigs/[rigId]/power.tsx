import { useLocalSearchParams } from 'expo-router';

import { PowerScreen } from '@/features/rigs/components/power-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <PowerScreen rigId={rigId} />;
}
