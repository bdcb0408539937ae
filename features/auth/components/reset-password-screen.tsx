import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { Text } from 'react-native';

import { TextField } from '@/components/text-field';
import { Button } from '@/components/ui';
import { type ResetPasswordForm, resetPasswordSchema } from '@/shared/schemas/auth';
import { useResetPasswordMutation } from '../api/auth-actions';
import { alertStyle, AuthFrame, linkStyle } from './auth-frame';

export function ResetPasswordScreen() {
  const { token, error } = useLocalSearchParams<{ token?: string; error?: string }>();
  const router = useRouter();
  const reset = useResetPasswordMutation();
  const form = useForm<ResetPasswordForm>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { password: '', confirm: '' } });
  const onSubmit = form.handleSubmit((values) =>
    reset.mutate({ newPassword: values.password, token: token ?? '' }, { onSuccess: () => router.replace({ pathname: '/sign-in', params: { reset: '1' } }) }),
  );
  if (!token || error) {
    return (
      <AuthFrame title="This link does not work">
        <Text style={alertStyle}>The reset link has expired or was already used.</Text>
        <Link href="/forgot-password" style={linkStyle}>
          Ask for a new link
        </Link>
      </AuthFrame>
    );
  }
  return (
    <AuthFrame title="Choose a new password" testID="reset-password-screen">
      <TextField control={form.control} name="password" label="New password" hint="At least 10 characters." secureTextEntry autoComplete="new-password" />
      <TextField control={form.control} name="confirm" label="The same again" secureTextEntry autoComplete="new-password" onSubmitEditing={onSubmit} />
      {reset.isError ? <Text role="alert" style={alertStyle}>The link has expired or was already used. Ask for a new one.</Text> : null}
      <Button label="Save the new password" onPress={onSubmit} busy={reset.isPending} />
    </AuthFrame>
  );
}
