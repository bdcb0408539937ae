import { useLocalSearchParams } from 'expo-router';

import { HistoryScreen } from '@/features/rigs/components/history-screen';

export default function History() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <HistoryScreen rigId={rigId} />;
}
