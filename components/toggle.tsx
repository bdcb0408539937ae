// An on/off switch as one 44 px row: the label and the track together are the target; Space or Enter flips it.
import { useId } from 'react';
import { type Control, Controller, type FieldPath, type FieldValues } from 'react-hook-form';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { colors, space, type } from '@/shared/theme';
import { isFocused, onKeys, useFormFrame } from './form-frame';

export function Toggle({ label, hint, value, onChange, disabled, testID }: { label: string; hint?: string; value: boolean; onChange: (on: boolean) => void; disabled?: boolean; testID?: string }) {
  const id = useId();
  return (
    <Pressable
      role="switch"
      aria-checked={value}
      aria-labelledby={`${id}-label`}
      aria-describedby={hint ? `${id}-hint` : undefined}
      aria-disabled={disabled || undefined}
      disabled={disabled}
      testID={testID}
      onPress={() => onChange(!value)}
      {...onKeys((e) => {
        if (e.key === ' ' && !disabled) {
          e.preventDefault();
          onChange(!value);
        }
      })}
      style={(state) => [styles.row, isFocused(state) && styles.focused]}
    >
      <View style={{ flex: 1 }}>
        <Text nativeID={`${id}-label`} style={styles.label}>
          {label}
        </Text>
        {hint ? (
          <Text nativeID={`${id}-hint`} style={styles.hint}>
            {hint}
          </Text>
        ) : null}
      </View>
      <View style={[styles.track, value && styles.trackOn, disabled && styles.off]}>
        <View style={[styles.thumb, value && styles.thumbOn]} />
      </View>
    </Pressable>
  );
}

export function SwitchField<T extends FieldValues>({ control, name, label, hint }: { control: Control<T>; name: FieldPath<T>; label: string; hint?: string }) {
  const frame = useFormFrame();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => <Toggle testID={`field-${name}`} label={label} hint={hint} value={!!field.value} onChange={field.onChange} disabled={frame.readOnly} />}
    />
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md, minHeight: 44, paddingVertical: space.xs, borderRadius: 8 },
  focused: { outlineColor: colors.focus, outlineWidth: 2, outlineStyle: 'solid', outlineOffset: 2 } as object,
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  hint: { ...type.small, color: colors.inkSoft },
  track: { width: 52, height: 32, borderRadius: 16, backgroundColor: colors.card, borderWidth: 2, borderColor: colors.inkSoft, justifyContent: 'center', paddingHorizontal: 2 },
  trackOn: { backgroundColor: colors.night, borderColor: colors.night },
  thumb: { width: 24, height: 24, borderRadius: 12, backgroundColor: colors.inkSoft },
  thumbOn: { backgroundColor: colors.lamp, alignSelf: 'flex-end' },
  off: { opacity: 0.6 },
});
