import { Slot, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { RigTabs } from '@/features/rigs/components/rig-tabs';

export default function RigLayout() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return (
    <View style={{ gap: 16 }}>
      <RigTabs rigId={rigId} />
      <Slot />
    </View>
  );
}
