import { useLocalSearchParams } from 'expo-router';

import { OutlookScreen } from '@/features/rigs/components/outlook-screen';

export default function Route() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <OutlookScreen rigId={rigId} />;
}
