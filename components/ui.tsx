// Small UI primitives every feature uses, all drawn from the theme.
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, type TextStyle, View, type ViewStyle } from 'react-native';

import { colors, radius, space, type } from '@/shared/theme';
import { isFocused } from './form-frame';

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

type TextProps = { children: ReactNode; style?: TextStyle; testID?: string; nativeID?: string };

export function Body({ children, style, testID }: TextProps) {
  return (
    <Text testID={testID} style={[styles.body, style]}>
      {children}
    </Text>
  );
}

export function Small({ children, style, testID, nativeID }: TextProps) {
  return (
    <Text testID={testID} nativeID={nativeID} style={[styles.small, style]}>
      {children}
    </Text>
  );
}

/** primary: the screen's main action; secondary: Cancel, Keep and the like; danger: deletes or leaves. */
export type ButtonTone = 'primary' | 'secondary' | 'danger';

export function Button({
  label,
  onPress,
  busy,
  disabled,
  testID,
  tone = 'primary',
  accessibilityLabel,
}: {
  label: string;
  onPress: () => void;
  busy?: boolean;
  disabled?: boolean;
  testID?: string;
  tone?: ButtonTone;
  /** A longer name for screen readers when the label leans on what is around it ("Edit" → "Edit Fridge"). */
  accessibilityLabel?: string;
}) {
  const off = disabled || busy;
  return (
    <Pressable
      testID={testID}
      role="button"
      aria-label={accessibilityLabel}
      aria-busy={busy}
      aria-disabled={off}
      disabled={off}
      onPress={onPress}
      style={(state) => [styles.button, tone !== 'primary' && styles[tone], state.pressed && (tone === 'primary' ? styles.buttonPressed : styles.quietPressed), isFocused(state) && styles.focused, off && styles.buttonOff]}
    >
      <Text style={[styles.buttonLabel, tone === 'secondary' && { color: colors.night }, tone === 'danger' && { color: colors.short }]}>{busy ? 'Working…' : label}</Text>
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
    borderWidth: 2,
    borderColor: colors.night,
    minHeight: 44,
    justifyContent: 'center',
    paddingVertical: space.sm,
    paddingHorizontal: space.xl,
    alignItems: 'center',
    alignSelf: 'flex-start',
  },
  // Quieter actions are outlined; a destructive one is outlined in the Short red, never filled like the main action.
  secondary: { backgroundColor: colors.card, borderColor: colors.night },
  danger: { backgroundColor: colors.card, borderColor: colors.short },
  buttonPressed: { backgroundColor: colors.nightSoft },
  quietPressed: { backgroundColor: colors.paper },
  focused: { outlineColor: colors.focus, outlineWidth: 2, outlineStyle: 'solid', outlineOffset: 2 } as object,
  buttonOff: { opacity: 0.6 },
  buttonLabel: { ...type.heading, color: colors.paper },
});
