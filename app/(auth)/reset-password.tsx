import { ResetPasswordScreen } from '@/features/auth/components/reset-password-screen';

export default function Route() {
  return <ResetPasswordScreen />;
}
