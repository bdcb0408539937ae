import { SignInScreen } from '@/features/auth/components/sign-in-screen';

export default function Route() {
  return <SignInScreen />;
}
