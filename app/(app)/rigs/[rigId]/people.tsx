import { useLocalSearchParams, useRouter } from 'expo-router';
import { ActivityIndicator, Text } from 'react-native';

import { useMeQuery } from '@/features/auth/api/session';
import { PeopleScreen } from '@/features/people/components/people-screen';
import { useRigQuery } from '@/features/rigs/api/rig';

export default function People() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const me = useMeQuery();
  const rig = useRigQuery(rigId);
  const router = useRouter();
  if (rig.isError) return <Text role="alert">{rig.error.message}</Text>;
  if (!rig.data) return <ActivityIndicator />;
  return <PeopleScreen rigId={rigId} myUserId={me.data?.user.id ?? ''} canManage={rig.data.permissions.managePeople} onLeft={() => router.replace('/')} />;
}
