import { SignUpScreen } from '@/features/auth/components/sign-up-screen';

export default function Route() {
  return <SignUpScreen />;
}
