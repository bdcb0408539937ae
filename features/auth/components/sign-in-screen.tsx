import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { Text, View } from 'react-native';

import { Form, SubmitButton } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Body } from '@/components/ui';
import { ApiError } from '@/lib/api-client';
import { safeNext } from '@/lib/app-url';
import { type SignInForm, signInSchema } from '@/shared/schemas/auth';
import { space } from '@/shared/theme';
import { useSignInMutation } from '../api/auth-actions';
import { alertStyle, AuthFrame, linkStyle, okStyle, rowStyle } from './auth-frame';

function signInError(err: unknown): string {
  if (err instanceof ApiError) {
    if (err.status === 401) return 'That e-mail and password do not match an account.';
    if (err.status === 403) return 'Confirm your e-mail address first: follow the link we sent you.';
    if (err.status === 429) return 'Too many attempts. Wait a minute and try again.';
  }
  return 'Signing in did not work. Check your connection and try again.';
}

export function SignInScreen() {
  const params = useLocalSearchParams<{ next?: string; reset?: string }>();
  const router = useRouter();
  const signIn = useSignInMutation();
  const form = useForm<SignInForm>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const onSubmit = form.handleSubmit((values) =>
    signIn.mutate(values, { onSuccess: () => router.replace(safeNext(params.next) as never) }),
  );
  return (
    <Form control={form.control} onSubmit={onSubmit} busy={signIn.isPending}>
    <AuthFrame title="Sign in" testID="sign-in-screen">
      {params.reset ? <Text style={okStyle}>Your password is changed. Sign in with the new one.</Text> : null}
      <TextField control={form.control} name="email" label="E-mail" autoComplete="email" inputMode="email" autoCapitalize="none" />
      <TextField control={form.control} name="password" label="Password" autoComplete="current-password" secureTextEntry />
      {signIn.isError ? (
        <Text role="alert" style={alertStyle} testID="sign-in-error">
          {signInError(signIn.error)}
        </Text>
      ) : null}
      <SubmitButton testID="sign-in-submit" label="Sign in" />
      <View style={{ gap: space.sm }}>
        <Link href="/forgot-password" style={linkStyle}>
          Forgot your password?
        </Link>
        <View style={rowStyle}>
          <Body>New to Keyoff?</Body>
          <Link href={{ pathname: '/sign-up', params: params.next ? { next: params.next } : {} }} style={linkStyle}>
            Create an account
          </Link>
        </View>
      </View>
    </AuthFrame>
    </Form>
  );
}
