import { useLocalSearchParams } from 'expo-router';

import { ReportsScreen } from '@/features/rigs/components/reports-screen';

export default function Reports() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <ReportsScreen rigId={rigId} />;
}
