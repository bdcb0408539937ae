import { zodResolver } from '@hookform/resolvers/zod';
import { Link, useLocalSearchParams, useRouter } from 'expo-router';
import { useForm } from 'react-hook-form';
import { Text, View } from 'react-native';

import { Form, SubmitButton } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Body } from '@/components/ui';
import { ApiError } from '@/lib/api-client';
import { appUrl, safeNext } from '@/lib/app-url';
import { type SignUpForm, signUpSchema } from '@/shared/schemas/auth';
import { useSignUpMutation } from '../api/auth-actions';
import { alertStyle, AuthFrame, linkStyle, rowStyle } from './auth-frame';

export function SignUpScreen() {
  const params = useLocalSearchParams<{ next?: string }>();
  const router = useRouter();
  const signUp = useSignUpMutation();
  const form = useForm<SignUpForm>({ resolver: zodResolver(signUpSchema), defaultValues: { name: '', email: '', password: '' } });
  const onSubmit = form.handleSubmit((values) =>
    signUp.mutate(
      { ...values, callbackURL: appUrl(safeNext(params.next)) },
      { onSuccess: () => router.replace({ pathname: '/check-inbox', params: { email: values.email } }) },
    ),
  );
  const error =
    signUp.error instanceof ApiError && signUp.error.status === 422
      ? 'An account with this e-mail already exists. Sign in instead.'
      : signUp.error instanceof ApiError && signUp.error.status === 429
        ? 'Too many attempts. Wait a minute and try again.'
        : signUp.error
          ? signUp.error.message
          : null;
  return (
    <Form control={form.control} onSubmit={onSubmit} busy={signUp.isPending}>
    <AuthFrame title="Create your account" testID="sign-up-screen">
      <TextField control={form.control} name="name" label="Your name" autoComplete="name" maxLength={80} />
      <TextField control={form.control} name="email" label="E-mail" autoComplete="email" inputMode="email" autoCapitalize="none" />
      <TextField control={form.control} name="password" label="Password" hint="At least 10 characters." autoComplete="new-password" secureTextEntry maxLength={128} />
      {error ? (
        <Text role="alert" style={alertStyle}>
          {error}
        </Text>
      ) : null}
      <SubmitButton testID="sign-up-submit" label="Create account" />
      <View style={rowStyle}>
        <Body>Already have an account?</Body>
        <Link href={{ pathname: '/sign-in', params: params.next ? { next: params.next } : {} }} style={linkStyle}>
          Sign in
        </Link>
      </View>
    </AuthFrame>
    </Form>
  );
}
