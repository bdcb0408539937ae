import { useLocalSearchParams } from 'expo-router';

import { RigCableRunsScreen } from '@/features/rigs/components/rig-cable-runs-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <RigCableRunsScreen rigId={rigId} />;
}
