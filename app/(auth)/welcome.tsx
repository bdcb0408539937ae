import { WelcomeScreen } from '@/features/shell/components/welcome-screen';

export default function Welcome() {
  return <WelcomeScreen />;
}
