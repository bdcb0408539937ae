import { Slot } from 'expo-router';

import { AccountMenu } from '@/features/auth/components/account-menu';
import { SessionGate } from '@/features/auth/components/session-gate';
import { usePrefetchRigFromAddress } from '@/features/rigs/api/prefetch-rig';
import { AppShell } from '@/features/shell/components/app-shell';

export default function AppLayout() {
  usePrefetchRigFromAddress();
  return (
    <SessionGate>
      {(me) => (
        <AppShell account={<AccountMenu me={me} />} accountCompact={<AccountMenu me={me} compact />} advisor={me.user.role === 'advisor' || me.households.some((h) => h.role === 'advisor')}>
          <Slot />
        </AppShell>
      )}
    </SessionGate>
  );
}
