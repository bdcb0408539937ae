import { Pressable, StyleSheet, Text, View } from 'react-native';

import { PageTitle } from '@/components/page-title';
import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { type Units, useUnits } from '@/components/units';
import { colors, space, type } from '@/shared/theme';
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
          <View key={c.key} style={{ gap: space.xs }} role="radiogroup" aria-label={c.label}>
            <Body>{c.label}</Body>
            <View style={styles.row}>
              {c.options.map((o) => {
                const on = units[c.key] === o.value;
                return (
                  <Pressable key={o.value} role="radio" aria-checked={on} testID={`unit-${c.key}-${o.value}`} onPress={() => setUnits({ ...units, [c.key]: o.value } as Units)} style={[styles.chip, on && styles.chipOn]}>
                    <Text style={[styles.chipText, on && styles.chipTextOn]}>{o.label}</Text>
                  </Pressable>
                );
              })}
            </View>
          </View>
        ))}
      </Card>
      {isAdmin ? <DeliveryProblemsCard /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  chip: { borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs + 2, backgroundColor: colors.card },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
});
