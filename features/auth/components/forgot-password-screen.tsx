import { zodResolver } from '@hookform/resolvers/zod';
import { Link } from 'expo-router';
import { useForm } from 'react-hook-form';
import { Text } from 'react-native';

import { TextField } from '@/components/text-field';
import { Body, Button } from '@/components/ui';
import { appUrl } from '@/lib/app-url';
import { type ForgotPasswordForm, forgotPasswordSchema } from '@/shared/schemas/auth';
import { useForgotPasswordMutation } from '../api/auth-actions';
import { alertStyle, AuthFrame, linkStyle, okStyle } from './auth-frame';

export function ForgotPasswordScreen() {
  const forgot = useForgotPasswordMutation();
  const form = useForm<ForgotPasswordForm>({ resolver: zodResolver(forgotPasswordSchema), defaultValues: { email: '' } });
  const onSubmit = form.handleSubmit((values) => forgot.mutate({ ...values, redirectTo: appUrl('/reset-password') }));
  return (
    <AuthFrame title="Forgot your password?" testID="forgot-password-screen">
      <Body>Give the address you signed up with; we will send a link to choose a new password.</Body>
      <TextField control={form.control} name="email" label="E-mail" autoComplete="email" inputMode="email" autoCapitalize="none" />
      {forgot.isSuccess ? <Text style={okStyle}>If an account uses this address, a link is on its way.</Text> : null}
      {forgot.isError ? <Text role="alert" style={alertStyle}>That did not work; try again in a minute.</Text> : null}
      <Button label="Send the link" onPress={onSubmit} busy={forgot.isPending} />
      <Link href="/sign-in" style={linkStyle}>
        Back to sign in
      </Link>
    </AuthFrame>
  );
}
