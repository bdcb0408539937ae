import { useLocalSearchParams, useRouter } from 'expo-router';

import { InvitationScreen } from '@/features/people/components/invitation-screen';

export default function Invitation() {
  const { invitationId } = useLocalSearchParams<{ invitationId: string }>();
  const router = useRouter();
  return <InvitationScreen invitationId={invitationId} onAccepted={() => router.replace('/')} />;
}
