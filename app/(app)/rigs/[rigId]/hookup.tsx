import { useLocalSearchParams } from 'expo-router';

import { HookupScreen } from '@/features/rigs/components/hookup-screen';
import type { FixKind } from '@/shared/energy/project';

export default function Route() {
  const { rigId, fix } = useLocalSearchParams<{ rigId: string; fix?: string }>();
  return <HookupScreen rigId={rigId} fix={(fix as FixKind | undefined) ?? null} />;
}
