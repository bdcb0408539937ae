import { Slot, useLocalSearchParams } from 'expo-router';
import { View } from 'react-native';

import { useNotesQuery } from '@/features/notes/api/notes';
import { RigGate } from '@/features/rigs/components/rig-gate';
import { RigTabs } from '@/features/rigs/components/rig-tabs';

export default function RigLayout() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return (
    <RigGate rigId={rigId}>
      <RigWorkspace rigId={rigId} />
    </RigGate>
  );
}

function RigWorkspace({ rigId }: { rigId: string }) {
  const notes = useNotesQuery(rigId);
  return (
    <View style={{ gap: 16 }}>
      <RigTabs rigId={rigId} unreadNotes={notes.data?.unread} />
      <Slot />
    </View>
  );
}
