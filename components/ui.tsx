// Small UI primitives every feature uses, all drawn from the theme.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, type TextStyle, View, type ViewStyle } from 'react-native';

import { colors, radius, space, type } from '@/shared/theme';

export function Card({ children, style, testID }: { children: ReactNode; style?: ViewStyle; testID?: string }) {
  return (
    <View testID={testID} style={[styles.card, style]}>
      {children}
    </View>
  );
}

export function Title({ children }: { children: ReactNode }) {
  return (
    <Text role="heading" aria-level={1} style={styles.title}>
      {children}
    </Text>
  );
}

export function Heading({ children }: { children: ReactNode }) {
  return (
    <Text role="heading" aria-level={2} style={styles.heading}>
      {children}
    </Text>
  );
}

type TextProps = { children: ReactNode; style?: TextStyle; testID?: string };

export function Body({ children, style, testID }: TextProps) {
  return (
    <Text testID={testID} style={[styles.body, style]}>
      {children}
    </Text>
  );
}

export function Small({ children, style, testID }: TextProps) {
  return (
    <Text testID={testID} style={[styles.small, style]}>
      {children}
    </Text>
  );
}

export function Button({
  label,
  onPress,
  busy,
  disabled,
  testID,
}: {
  label: string;
  onPress: () => void;
  busy?: boolean;
  disabled?: boolean;
  testID?: string;
}) {
  const off = disabled || busy;
  return (
    <Pressable
      testID={testID}
      role="button"
      aria-busy={busy}
      aria-disabled={off}
      disabled={off}
      onPress={onPress}
      style={({ pressed }) => [styles.button, pressed && styles.buttonPressed, off && styles.buttonOff]}
    >
      <Text style={styles.buttonLabel}>{busy ? 'Working…' : label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.card,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.lg,
    gap: space.sm,
  },
  title: { ...type.title, color: colors.ink },
  heading: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  small: { ...type.small, color: colors.inkSoft },
  button: {
    backgroundColor: colors.night,
    borderRadius: radius.md,
    paddingVertical: space.md,
    paddingHorizontal: space.xl,
    alignItems: 'center',
    alignSelf: 'flex-start',
  },
  buttonPressed: { backgroundColor: colors.nightSoft },
  buttonOff: { opacity: 0.6 },
  buttonLabel: { ...type.heading, color: colors.paper },
});
