import { Text, View } from 'react-native';

import { PageTitle } from '@/components/page-title';
import { Card, Heading, Small, Title } from '@/components/ui';
import { ChipGroup } from '@/components/chips';
import { type Units, useUnits } from '@/components/units';
import { colors, space } from '@/shared/theme';
import type { EnergyUnit } from '@/shared/units';
import { DeliveryProblemsCard } from './delivery-problems-card';
import { EmailPrefsCard } from './email-prefs-card';

const CHOICES: { key: keyof Units; label: string; options: { value: string; label: string }[] }[] = [
  { key: 'power', label: 'Device power', options: [{ value: 'W', label: 'Watts (W)' }, { value: 'A', label: 'Amps at the battery (A)' }] },
  { key: 'energy', label: 'Energy', options: [{ value: 'Ah', label: 'Amp-hours (Ah)' }, { value: 'Wh', label: 'Watt-hours (Wh)' }] },
  { key: 'temperature', label: 'Temperature', options: [{ value: 'C', label: '°C' }, { value: 'F', label: '°F' }] },
  { key: 'wire', label: 'Wire sizes', options: [{ value: 'AWG', label: 'AWG' }, { value: 'mm2', label: 'mm²' }] },
];

/**
 * Settings: e-mail preferences (kept on the server), units (kept on this device; the energy unit on the
 * account too, through energyOnAccount, for the e-mails), and for admins the e-mail failures.
 */
export function SettingsScreen({ isAdmin = false, energyOnAccount }: { isAdmin?: boolean; energyOnAccount?: { save: (energy: EnergyUnit) => void; error: string | null } }) {
  const { units, setUnits } = useUnits();
  const choose = (key: keyof Units, value: string) => {
    if (units[key] === value) return;
    setUnits({ ...units, [key]: value } as Units);
    if (key === 'energy') energyOnAccount?.save(value as EnergyUnit);
  };
  return (
    <View style={{ gap: space.lg }} testID="settings-screen">
      <PageTitle parts={['Settings']} />
      <Title>Settings</Title>
      <EmailPrefsCard />
      <Card>
        <Heading>Units</Heading>
        <Small>Kept on this device; the energy unit also on your account, so your e-mails use it (watt-hours at each rig’s system voltage). The model always works in amps and amp-hours at the battery.</Small>
        {CHOICES.map((c) => (
          <ChipGroup key={c.key} label={c.label} options={c.options} value={units[c.key] as string} onChange={(v) => choose(c.key, v)} testIDPrefix={`unit-${c.key}`} />
        ))}
        {energyOnAccount?.error ? (
          <Text role="alert" style={{ color: colors.short }}>
            The energy unit is kept on this device but not on your account yet: {energyOnAccount.error}
          </Text>
        ) : null}
      </Card>
      {isAdmin ? <DeliveryProblemsCard /> : null}
    </View>
  );
}
