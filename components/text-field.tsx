import { useId } from 'react';
import { type Control, Controller, type FieldPath, type FieldValues } from 'react-hook-form';
import { StyleSheet, Text, TextInput, type TextInputProps, View } from 'react-native';

import { colors, space } from '@/shared/theme';
import { FieldNote, fieldStyles, useFormFrame } from './form-frame';

/**
 * A labelled text input bound to react-hook-form, with its error inline. With `maxLength` the limit is
 * shown as a count; Enter in a one-line field submits the form it is in.
 */
export function TextField<T extends FieldValues>({
  control,
  name,
  label,
  hint,
  style,
  maxLength,
  ...input
}: { control: Control<T>; name: FieldPath<T>; label: string; hint?: string } & Omit<TextInputProps, 'value' | 'onChangeText'>) {
  const testID = `field-${name}`;
  const id = useId();
  const frame = useFormFrame();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const length = String(field.value ?? '').length;
        const error = fieldState.error?.message;
        return (
          <View style={fieldStyles.field}>
            <View style={styles.head}>
              <Text nativeID={`${id}-label`} style={[fieldStyles.label, { flex: 1 }]}>
                {label}
              </Text>
              {maxLength ? (
                <Text nativeID={`${id}-count`} style={[fieldStyles.hint, length >= maxLength && { color: colors.short }]}>
                  {length} of {maxLength}
                </Text>
              ) : null}
            </View>
            <TextInput
              ref={field.ref}
              testID={testID}
              aria-labelledby={`${id}-label`}
              aria-describedby={[error ? `${id}-error` : hint ? `${id}-hint` : null, maxLength ? `${id}-count` : null].filter(Boolean).join(' ') || undefined}
              aria-invalid={!!error}
              readOnly={frame.readOnly}
              value={field.value ?? ''}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              onSubmitEditing={input.multiline ? undefined : frame.submit}
              enterKeyHint={input.multiline ? undefined : 'done'}
              placeholderTextColor={colors.inkSoft}
              maxLength={maxLength}
              {...input}
              style={[fieldStyles.input, frame.readOnly && fieldStyles.inputReadOnly, error ? fieldStyles.inputError : null, style]}
            />
            <FieldNote id={id} hint={hint} error={error} />
          </View>
        );
      }}
    />
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'baseline', gap: space.sm },
});
