import { NotFoundScreen } from '@/features/shell/components/not-found-screen';

export default function NotFound() {
  return <NotFoundScreen />;
}
