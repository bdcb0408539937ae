import { useRef } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';

import { colors, radius, space, TAP_MIN, type } from '@/shared/theme';

/** A button that opens the browser's file chooser; the chosen File goes to onPick. */
export function FilePicker({ label, accept, onPick, testID }: { label: string; accept: string; onPick: (file: File) => void; testID?: string }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept={accept}
        data-testid={testID ? `${testID}-input` : undefined}
        style={{ display: 'none' }}
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) onPick(file);
          e.target.value = '';
        }}
      />
      <Pressable role="button" onPress={() => input.current?.click()} style={styles.button} testID={testID}>
        <Text style={styles.label}>{label}</Text>
      </Pressable>
    </>
  );
}

const styles = StyleSheet.create({
  button: { minHeight: TAP_MIN, justifyContent: 'center', borderWidth: 1, borderColor: colors.night, borderRadius: radius.md, paddingHorizontal: space.lg, paddingVertical: space.sm, alignSelf: 'flex-start', backgroundColor: colors.card },
  label: { ...type.heading, fontSize: 15, color: colors.night },
});
