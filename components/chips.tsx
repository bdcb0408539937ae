// A row of chips that behaves as a radio group: one tab stop (the chosen chip), arrow keys move the
// choice, Space or Enter picks the focused chip; each chip at least 44 px high.
import { useId } from 'react';
import { type Control, Controller, type FieldPath, type FieldValues } from 'react-hook-form';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { colors, space, type } from '@/shared/theme';
import { FieldNote, isFocused, type KeyEvent, onKeys, useFormFrame } from './form-frame';

export type ChipOption<V> = { value: V; label: string; testID?: string };

export function ChipGroup<V extends string | number | null>({
  label,
  showLabel = true,
  options,
  value,
  onChange,
  testIDPrefix,
  disabled,
  focusRef,
  invalid,
  describedBy,
}: {
  label: string;
  showLabel?: boolean;
  options: ChipOption<V>[];
  value: V;
  onChange: (v: V) => void;
  testIDPrefix: string;
  disabled?: boolean;
  /** Receives the chip that takes focus for the group (react-hook-form focuses it on an error). */
  focusRef?: (el: unknown) => void;
  invalid?: boolean;
  describedBy?: string;
}) {
  const id = useId();
  const chosen = options.findIndex((o) => o.value === value);
  const tabStop = chosen >= 0 ? chosen : 0;
  // The chips are siblings in the page: focus moves to the next one through the DOM (keys exist on the web only).
  const move = (e: KeyEvent, from: number, by: number) => {
    const next = (from + by + options.length) % options.length;
    onChange(options[next].value);
    const chip = (e as unknown as { currentTarget?: { parentElement?: { children: ArrayLike<{ focus?: () => void }> } } }).currentTarget;
    chip?.parentElement?.children[next]?.focus?.();
  };
  const onKey = (i: number) => (e: KeyEvent) => {
    if (disabled) return;
    if (e.key === 'ArrowRight' || e.key === 'ArrowDown') {
      e.preventDefault();
      move(e, i, 1);
    } else if (e.key === 'ArrowLeft' || e.key === 'ArrowUp') {
      e.preventDefault();
      move(e, i, -1);
    } else if (e.key === ' ') {
      e.preventDefault();
      onChange(options[i].value);
    }
  };
  return (
    <View style={styles.group}>
      {showLabel ? (
        <Text nativeID={`${id}-label`} style={styles.label}>
          {label}
        </Text>
      ) : null}
      <View
        role="radiogroup"
        aria-labelledby={showLabel ? `${id}-label` : undefined}
        aria-label={showLabel ? undefined : label}
        aria-invalid={invalid || undefined}
        aria-describedby={describedBy}
        aria-disabled={disabled || undefined}
        style={styles.chips}
      >
        {options.map((o, i) => {
          const on = o.value === value;
          return (
            <Pressable
              key={String(o.value)}
              ref={i === tabStop ? (focusRef as never) : undefined}
              role="radio"
              aria-checked={on}
              aria-disabled={disabled || undefined}
              disabled={disabled}
              tabIndex={i === tabStop ? 0 : -1}
              testID={o.testID ?? `${testIDPrefix}-${o.value}`}
              onPress={() => onChange(o.value)}
              {...onKeys(onKey(i))}
              style={(state) => [styles.chip, on && styles.chipOn, isFocused(state) && styles.chipFocused, disabled && !on && styles.chipOff]}
            >
              <Text style={[styles.chipLabel, on && styles.chipLabelOn]}>{o.label}</Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

/** One of a few values, as a radio group of chips bound to react-hook-form. */
export function ChoiceField<T extends FieldValues, V extends string | number>({
  control,
  name,
  label,
  options,
  hint,
}: { control: Control<T>; name: FieldPath<T>; label: string; hint?: string; options: ChipOption<V>[] }) {
  const frame = useFormFrame();
  const id = useId();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View style={styles.field}>
          <ChipGroup
            label={label}
            options={options}
            value={field.value}
            onChange={(v) => {
              field.onChange(v);
              field.onBlur();
            }}
            testIDPrefix={`field-${name}`}
            disabled={frame.readOnly}
            focusRef={field.ref}
            invalid={!!fieldState.error}
            describedBy={fieldState.error ? `${id}-error` : hint ? `${id}-hint` : undefined}
          />
          <FieldNote id={id} hint={hint} error={fieldState.error?.message} />
        </View>
      )}
    />
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  group: { gap: space.xs },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.lg, backgroundColor: colors.card },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipOff: { opacity: 0.6 },
  chipFocused: { outlineColor: colors.focus, outlineWidth: 2, outlineStyle: 'solid', outlineOffset: 2 } as object,
  chipLabel: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipLabelOn: { color: colors.paper },
});
