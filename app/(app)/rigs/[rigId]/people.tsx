import { useLocalSearchParams, useRouter } from 'expo-router';

import { useMeQuery } from '@/features/auth/api/session';
import { PeopleScreen } from '@/features/people/components/people-screen';

export default function People() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  const me = useMeQuery();
  const router = useRouter();
  return <PeopleScreen rigId={rigId} myUserId={me.data?.user.id ?? ''} onLeft={() => router.replace('/')} />;
}
