import { useState } from 'react';
import { Pressable, Text, View } from 'react-native';

import { Body } from '@/components/ui';
import { colors, space } from '@/shared/theme';
import { styles } from './styles';

export function Toggle({ label, value, onChange, testID }: { label: string; value: boolean; onChange: (v: boolean) => void; testID: string }) {
  return (
    <Pressable role="checkbox" aria-checked={value} onPress={() => onChange(!value)} style={{ flexDirection: 'row', gap: space.sm, alignItems: 'center' }} testID={testID}>
      <View style={[styles.box, value && styles.boxOn]}>{value ? <Text style={{ color: colors.paper, fontSize: 12 }}>✓</Text> : null}</View>
      <Body>{label}</Body>
    </Pressable>
  );
}

/** A delete button that asks once more, so one slip of a finger deletes nothing. */
export function DeleteButton({ label, onDelete, testID }: { label: string; onDelete: () => void; testID: string }) {
  const [asking, setAsking] = useState(false);
  return (
    <Pressable role="button" onPress={() => (asking ? (setAsking(false), onDelete()) : setAsking(true))} style={[styles.chip, asking && styles.chipOn]} testID={testID}>
      <Text style={[styles.chipText, asking && styles.chipTextOn]}>{asking ? 'Press again to delete' : label}</Text>
    </Pressable>
  );
}
