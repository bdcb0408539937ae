import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator } from 'react-native';

import { SavedRunsScreen } from '@/features/cable-runs/components/saved-runs-screen';
import { useRigQuery } from '@/features/rigs/api/rig';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const rig = useRigQuery(rigId);
  if (!rig.data) return <ActivityIndicator />;
  const r = rig.data;
  return (
    <SavedRunsScreen
      rigId={rigId}
      canEdit={r.permissions.manageLoads}
      loads={r.loads.filter((l) => l.status === 'installed' && l.supply === 'dc').map((l) => ({ value: l.id, label: l.name }))}
      hasInverter={r.power.inverter !== null}
    />
  );
}
