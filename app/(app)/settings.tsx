import { SettingsScreen } from '@/features/settings/components/settings-screen';

export default function Settings() {
  return <SettingsScreen />;
}
