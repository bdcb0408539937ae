import { useLocalSearchParams } from 'expo-router';
import { ActivityIndicator } from 'react-native';

import { useCableRunsQuery } from '@/features/cable-runs/api/cable-runs';
import { ReadingsScreen } from '@/features/readings/components/readings-screen';
import { useRigQuery, useRigUpdateMutation } from '@/features/rigs/api/rig';

export default function Readings() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const rig = useRigQuery(rigId);
  const runs = useCableRunsQuery(rigId);
  const update = useRigUpdateMutation(rigId);
  if (!rig.data) return <ActivityIndicator />;
  const r = rig.data;
  return (
    <ReadingsScreen
      rigId={rigId}
      canEdit={r.permissions.manageLoads}
      cableRuns={(runs.data ?? []).map((c) => ({ id: c.id, label: c.label }))}
      onAdoptKeyOff={r.permissions.edit ? async (amps) => void (await update.mutateAsync({ version: r.version, power: { ...r.power, keyOffDrawA: amps } })) : undefined}
    />
  );
}
