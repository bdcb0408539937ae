import { ForgotPasswordScreen } from '@/features/auth/components/forgot-password-screen';

export default function Route() {
  return <ForgotPasswordScreen />;
}
