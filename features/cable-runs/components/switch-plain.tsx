import { StyleSheet, Switch, Text, View } from 'react-native';

import { colors, space, type } from '@/shared/theme';

/** A switch bound to local state (not a form field). */
export function SwitchFieldPlain({ label, value, onChange, testID }: { label: string; value: boolean; onChange: (on: boolean) => void; testID?: string }) {
  return (
    <View style={styles.row}>
      <Text style={styles.label}>{label}</Text>
      <Switch testID={testID} aria-label={label} value={value} onValueChange={onChange} trackColor={{ true: colors.nightSoft, false: colors.line }} thumbColor={value ? colors.lamp : '#FFFFFF'} />
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  label: { ...type.heading, fontSize: 15, color: colors.ink, flex: 1 },
});
