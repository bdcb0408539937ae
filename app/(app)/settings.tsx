import { useMeQuery } from '@/features/auth/api/session';
import { SettingsScreen } from '@/features/settings/components/settings-screen';

export default function Settings() {
  const me = useMeQuery();
  return <SettingsScreen isAdmin={me.data?.user.role === 'admin'} />;
}
