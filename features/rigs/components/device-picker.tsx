import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, TextInput, View } from 'react-native';

import { Small } from '@/components/ui';
import { filterDevices } from '@/shared/device-search';
import type { Device } from '@/shared/devices';
import { colors, radius, space, type } from '@/shared/theme';
import { useDevicesQuery } from '../api/devices';

const SHOWN = 8;

/** A typical device's draw in words: "40 W at 35 % for 24 h a day (DC)". */
export function deviceSummary(d: Device) {
  const l = d.load;
  const draw = l.amps !== undefined ? `${l.amps} A` : `${l.watts} W`;
  const duty = (l.dutyPercent ?? 100) < 100 ? ` at ${l.dutyPercent} %` : '';
  const hours = l.when === 'driving' ? 'while driving' : `for ${l.hoursPerDay} h a day${l.when === 'parked' ? ' parked' : ''}`;
  return `${draw}${duty} ${hours} (${l.supply === 'ac' ? 'AC, on the inverter' : 'DC'})`;
}

/** Searchable picking from the device catalogue; `onPick` gets the device, whose load the caller adjusts. */
export function DevicePicker({ onPick, label = 'Pick from typical devices', actionLabel = 'Use', disabled }: { onPick: (d: Device) => void; label?: string; actionLabel?: string; disabled?: (d: Device) => string | null }) {
  const devices = useDevicesQuery();
  const [query, setQuery] = useState('');
  if (devices.isPending) return <ActivityIndicator color={colors.night} />;
  if (devices.isError) return <Small style={{ color: colors.short }}>The device catalogue could not be loaded: {devices.error.message}</Small>;
  const found = filterDevices(devices.data, query);
  return (
    <View style={styles.root} testID="device-picker">
      <Text nativeID="device-search-label" style={styles.label}>
        {label}
      </Text>
      <TextInput testID="device-search" aria-labelledby="device-search-label" value={query} onChangeText={setQuery} placeholder="fridge, CPAP, laptop…" placeholderTextColor={colors.inkSoft} style={styles.input} />
      <Small>
        {found.length} of {devices.data.length} typical devices. Figures are typical: common practice or from memory; check your device&apos;s label.
      </Small>
      {found.slice(0, SHOWN).map((d) => {
        const why = disabled?.(d) ?? null;
        return (
          <View key={d.id} style={styles.row}>
            <View style={{ flex: 1, gap: 2 }}>
              <Text style={styles.name}>{d.name}</Text>
              <Small>
                {deviceSummary(d)} · {d.source}
              </Small>
              {why ? <Small style={{ color: colors.short }}>{why}</Small> : null}
            </View>
            <Pressable role="button" aria-label={`${actionLabel} ${d.name}`} aria-disabled={!!why} disabled={!!why} onPress={() => onPick(d)} style={[styles.pick, why ? { opacity: 0.5 } : null]} testID={`device-${d.id}`}>
              <Text style={styles.pickText}>{actionLabel}</Text>
            </Pressable>
          </View>
        );
      })}
      {found.length > SHOWN ? <Small>{found.length - SHOWN} more: type to narrow the list.</Small> : null}
      {found.length === 0 ? <Small>No typical device matches; enter your own below.</Small> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  input: { ...type.body, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.card, color: colors.ink, minHeight: 44 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.line },
  name: { ...type.body, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  pick: { borderWidth: 1, borderColor: colors.night, borderRadius: 999, paddingHorizontal: space.md, minHeight: 44, minWidth: 64, alignItems: 'center', justifyContent: 'center' },
  pickText: { ...type.small, color: colors.night, fontFamily: 'Nunito_700Bold' },
});
