import { Link, useLocalSearchParams } from 'expo-router';
import { Text } from 'react-native';

import { Body, Button, Small } from '@/components/ui';
import { appUrl } from '@/lib/app-url';
import { useResendVerificationMutation } from '../api/auth-actions';
import { AuthFrame, linkStyle, okStyle } from './auth-frame';

export function CheckInboxScreen() {
  const { email } = useLocalSearchParams<{ email?: string }>();
  const resend = useResendVerificationMutation();
  return (
    <AuthFrame title="Check your inbox" testID="check-inbox-screen">
      <Body>
        We sent a link to {email ? <Text style={{ fontFamily: 'Nunito_700Bold' }}>{email}</Text> : 'your address'}. Follow it to confirm your
        address; it signs you in and opens Keyoff.
      </Body>
      <Small>Nothing there? Look in the spam folder, or send it again.</Small>
      {email ? <Button label="Send the link again" onPress={() => resend.mutate({ email, callbackURL: appUrl('/') })} busy={resend.isPending} /> : null}
      {resend.isSuccess ? <Text style={okStyle}>Sent again.</Text> : null}
      <Link href="/sign-in" style={linkStyle}>
        Back to sign in
      </Link>
    </AuthFrame>
  );
}
