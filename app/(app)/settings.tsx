import { useMeQuery } from '@/features/auth/api/session';
import { useSaveEnergyUnitMutation } from '@/features/auth/api/units';
import { SettingsScreen } from '@/features/settings/components/settings-screen';

export default function Settings() {
  const me = useMeQuery();
  const saveEnergy = useSaveEnergyUnitMutation();
  return <SettingsScreen isAdmin={me.data?.user.role === 'admin'} energyOnAccount={{ save: saveEnergy.mutate, error: saveEnergy.error?.message ?? null }} />;
}
