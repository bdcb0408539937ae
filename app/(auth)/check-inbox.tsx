import { CheckInboxScreen } from '@/features/auth/components/check-inbox-screen';

export default function Route() {
  return <CheckInboxScreen />;
}
