import { useState } from 'react';
import { Pressable, Text } from 'react-native';

import { styles } from './styles';

export { Toggle } from '@/components/toggle';

/** A delete button that asks once more, so one slip of a finger deletes nothing. */
export function DeleteButton({ label, onDelete, testID }: { label: string; onDelete: () => void; testID: string }) {
  const [asking, setAsking] = useState(false);
  return (
    <Pressable role="button" onPress={() => (asking ? (setAsking(false), onDelete()) : setAsking(true))} style={[styles.chip, asking && styles.chipOn]} testID={testID}>
      <Text style={[styles.chipText, asking && styles.chipTextOn]}>{asking ? 'Press again to delete' : label}</Text>
    </Pressable>
  );
}
