import { type Control, Controller, type FieldPath, type FieldValues } from 'react-hook-form';
import { StyleSheet, Text, TextInput, type TextInputProps, View } from 'react-native';

import { colors, radius, space, type } from '@/shared/theme';

/** A labelled text input bound to react-hook-form, with its error inline. */
export function TextField<T extends FieldValues>({
  control,
  name,
  label,
  hint,
  style,
  ...input
}: { control: Control<T>; name: FieldPath<T>; label: string; hint?: string } & Omit<TextInputProps, 'value' | 'onChangeText'>) {
  const id = `field-${name}`;
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View style={styles.field}>
          <Text nativeID={`${id}-label`} style={styles.label}>
            {label}
          </Text>
          <TextInput
            testID={id}
            aria-labelledby={`${id}-label`}
            aria-invalid={!!fieldState.error}
            value={field.value ?? ''}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            placeholderTextColor={colors.inkSoft}
            {...input}
            style={[styles.input, fieldState.error ? styles.inputError : null, style]}
          />
          {hint && !fieldState.error ? <Text style={styles.hint}>{hint}</Text> : null}
          {fieldState.error ? (
            <Text role="alert" style={styles.error}>
              {fieldState.error.message}
            </Text>
          ) : null}
        </View>
      )}
    />
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  input: { ...type.body, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.card, color: colors.ink },
  inputError: { borderColor: colors.short, borderWidth: 2 },
  hint: { ...type.small, color: colors.inkSoft },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
});
