import { ActivityIndicator, Text, View } from 'react-native';

import { Body, Button, Card, Title } from '@/components/ui';
import { colors, space, type } from '@/shared/theme';
import { useInvitationAcceptMutation, useInvitationQuery } from '../api/people';

/** Accept an invitation: shown to the signed-in invitee. */
export function InvitationScreen({ invitationId, onAccepted }: { invitationId: string; onAccepted: () => void }) {
  const invitation = useInvitationQuery(invitationId);
  const accept = useInvitationAcceptMutation(invitationId);
  return (
    <View style={{ gap: space.lg }} testID="invitation-screen">
      <Title>An invitation</Title>
      <Card>
        {invitation.isPending ? (
          <ActivityIndicator color={colors.night} />
        ) : invitation.isError ? (
          <Text role="alert" style={{ ...type.body, color: colors.short }}>
            {invitation.error.message}
          </Text>
        ) : (
          <>
            <Body>
              {invitation.data.inviterName ?? 'Someone'} invites you to {invitation.data.householdName} as {invitation.data.role ?? 'member'}.
            </Body>
            <Button testID="accept-invitation" label="Accept" onPress={() => accept.mutate(undefined, { onSuccess: onAccepted })} busy={accept.isPending} />
            {accept.isError ? <Text role="alert" style={{ ...type.body, color: colors.short }}>{accept.error.message}</Text> : null}
          </>
        )}
      </Card>
    </View>
  );
}
