import { useRouter } from 'expo-router';
import { View } from 'react-native';

import { AccountsScreen } from '@/features/accounts/components/accounts-screen';
import { useMeQuery } from '@/features/auth/api/session';
import { RigsScreen } from '@/features/rigs/components/rigs-screen';

export default function Home() {
  const router = useRouter();
  const me = useMeQuery();
  // Admins run the service: their home is Accounts, with only the rigs a household shared with them.
  if (me.data?.user.role === 'admin') {
    return (
      <View style={{ gap: 24 }}>
        <AccountsScreen selfId={me.data.user.id} />
        <RigsScreen />
      </View>
    );
  }
  return <RigsScreen onNewRig={() => router.push('/rigs/new')} />;
}
