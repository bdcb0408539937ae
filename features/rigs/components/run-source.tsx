import { Pressable, StyleSheet, Text, View } from 'react-native';

import { colors, space, type } from '@/shared/theme';

export type RunSource = 'current' | 'load' | 'inverter';

/** Where a cable run takes its current from: typed in, one of the rig's loads, or the rig's inverter (its feed). */
export function RunSourceChips({ value, onChange, hasLoads, hasInverter }: { value: RunSource; onChange: (s: RunSource) => void; hasLoads: boolean; hasInverter: boolean }) {
  const options: { value: RunSource; label: string; testID?: string }[] = [
    { value: 'current', label: 'Enter the current' },
    ...(hasLoads ? [{ value: 'load' as const, label: "Take a load's current", testID: 'run-from-load' }] : []),
    ...(hasInverter ? [{ value: 'inverter' as const, label: 'Feeds the inverter', testID: 'run-from-inverter' }] : []),
  ];
  if (options.length < 2) return null;
  return (
    <View style={{ flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' }}>
      {options.map((o) => (
        <Pressable key={o.value} role="radio" aria-checked={value === o.value} onPress={() => onChange(o.value)} style={[styles.chip, value === o.value && styles.chipOn]} testID={o.testID}>
          <Text style={[styles.chipText, value === o.value && styles.chipTextOn]}>{o.label}</Text>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  chip: { borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
});
