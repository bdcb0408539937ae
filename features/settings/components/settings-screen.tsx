import { View } from 'react-native';

import { PageTitle } from '@/components/page-title';
import { Card, Heading, Small, Title } from '@/components/ui';
import { ChipGroup } from '@/components/chips';
import { type Units, useUnits } from '@/components/units';
import { space } from '@/shared/theme';
import { DeliveryProblemsCard } from './delivery-problems-card';
import { EmailPrefsCard } from './email-prefs-card';

const CHOICES: { key: keyof Units; label: string; options: { value: string; label: string }[] }[] = [
  { key: 'power', label: 'Device power', options: [{ value: 'W', label: 'Watts (W)' }, { value: 'A', label: 'Amps at the battery (A)' }] },
  { key: 'energy', label: 'Energy', options: [{ value: 'Ah', label: 'Amp-hours (Ah)' }, { value: 'Wh', label: 'Watt-hours (Wh)' }] },
  { key: 'temperature', label: 'Temperature', options: [{ value: 'C', label: '°C' }, { value: 'F', label: '°F' }] },
  { key: 'wire', label: 'Wire sizes', options: [{ value: 'AWG', label: 'AWG' }, { value: 'mm2', label: 'mm²' }] },
];

/** Settings: e-mail preferences (kept on the server), units (kept on this device), and for admins the e-mail failures. */
export function SettingsScreen({ isAdmin = false }: { isAdmin?: boolean }) {
  const { units, setUnits } = useUnits();
  return (
    <View style={{ gap: space.lg }} testID="settings-screen">
      <PageTitle parts={['Settings']} />
      <Title>Settings</Title>
      <EmailPrefsCard />
      <Card>
        <Heading>Units</Heading>
        <Small>Kept on this device. The model always works in amps and amp-hours at the battery.</Small>
        {CHOICES.map((c) => (
          <ChipGroup key={c.key} label={c.label} options={c.options} value={units[c.key] as string} onChange={(v) => setUnits({ ...units, [c.key]: v } as Units)} testIDPrefix={`unit-${c.key}`} />
        ))}
      </Card>
      {isAdmin ? <DeliveryProblemsCard /> : null}
    </View>
  );
}
