// Form fields on react-hook-form's Controller: a label, the control, the unit and the field's error inline.
import { useState } from 'react';
import { type Control, Controller, type FieldPath, type FieldValues, type UseFormSetError } from 'react-hook-form';
import { Pressable, StyleSheet, Switch, Text, TextInput, View } from 'react-native';


import { ApiError } from '@/lib/api-client';
import { colors, radius, space, type } from '@/shared/theme';

type Base<T extends FieldValues> = { control: Control<T>; name: FieldPath<T>; label: string; hint?: string };

function parseNumber(text: string): number {
  const t = text.trim().replace(',', '.');
  return t === '' ? Number.NaN : Number(t);
}

/** A number typed as text: what the user typed stays on screen; the form holds the number (NaN when it is not one). */
export function NumberField<T extends FieldValues>({
  control,
  name,
  label,
  unit,
  hint,
  toDisplay = (n) => n,
  fromDisplay = (n) => n,
}: Base<T> & { unit?: string; toDisplay?: (n: number) => number; fromDisplay?: (n: number) => number }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <NumberInput
          label={label}
          unit={unit}
          hint={hint}
          value={Number.isFinite(field.value) ? toDisplay(field.value) : field.value}
          onChange={(n) => field.onChange(Number.isFinite(n) ? fromDisplay(n) : n)}
          onBlur={field.onBlur}
          error={fieldState.error?.message}
          testID={`field-${name}`}
        />
      )}
    />
  );
}

function NumberInput(props: { label: string; unit?: string; hint?: string; value: number; onChange: (n: number) => void; onBlur: () => void; error?: string; testID: string }) {
  const [text, setText] = useState(Number.isFinite(props.value) ? String(props.value) : '');
  const id = props.testID;
  return (
    <View style={styles.field}>
      <Text nativeID={`${id}-label`} style={styles.label}>
        {props.label}
      </Text>
      <View style={styles.row}>
        <TextInput
          testID={id}
          aria-labelledby={`${id}-label`}
          aria-invalid={!!props.error}
          inputMode="decimal"
          value={text}
          onChangeText={(t) => {
            setText(t);
            props.onChange(parseNumber(t));
          }}
          onBlur={props.onBlur}
          style={[styles.input, props.error ? styles.inputError : null]}
        />
        {props.unit ? <Text style={styles.unit}>{props.unit}</Text> : null}
      </View>
      {props.hint && !props.error ? <Text style={styles.hint}>{props.hint}</Text> : null}
      {props.error ? (
        <Text role="alert" style={styles.error}>
          {props.error}
        </Text>
      ) : null}
    </View>
  );
}

/** One of a few values, as a row of buttons. */
export function ChoiceField<T extends FieldValues, V extends string | number>({ control, name, label, options, hint }: Base<T> & { options: { value: V; label: string }[] }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <View style={styles.field} role="radiogroup" aria-label={label}>
          <Text style={styles.label}>{label}</Text>
          <View style={styles.chips}>
            {options.map((o) => {
              const on = field.value === o.value;
              return (
                <Pressable key={String(o.value)} role="radio" aria-checked={on} testID={`field-${name}-${o.value}`} onPress={() => field.onChange(o.value)} style={[styles.chip, on && styles.chipOn]}>
                  <Text style={[styles.chipLabel, on && styles.chipLabelOn]}>{o.label}</Text>
                </Pressable>
              );
            })}
          </View>
          {hint ? <Text style={styles.hint}>{hint}</Text> : null}
          {fieldState.error ? <Text role="alert" style={styles.error}>{fieldState.error.message}</Text> : null}
        </View>
      )}
    />
  );
}

export function SwitchField<T extends FieldValues>({ control, name, label, hint }: Base<T>) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <View style={styles.switchRow}>
          <View style={{ flex: 1 }}>
            <Text style={styles.label}>{label}</Text>
            {hint ? <Text style={styles.hint}>{hint}</Text> : null}
          </View>
          <Switch testID={`field-${name}`} aria-label={label} value={!!field.value} onValueChange={field.onChange} trackColor={{ true: colors.nightSoft, false: colors.line }} thumbColor={field.value ? colors.lamp : '#FFFFFF'} />
        </View>
      )}
    />
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  input: { ...type.body, flex: 1, minWidth: 80, borderWidth: 1, borderColor: colors.line, borderRadius: radius.sm, paddingHorizontal: space.md, paddingVertical: space.sm, backgroundColor: colors.card, color: colors.ink },
  inputError: { borderColor: colors.short, borderWidth: 2 },
  unit: { ...type.body, color: colors.inkSoft, minWidth: 24 },
  hint: { ...type.small, color: colors.inkSoft },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs + 2, backgroundColor: colors.card },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipLabel: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipLabelOn: { color: colors.paper },
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
});

/**
 * Puts the server's field errors (an ApiError's `fields`) beside the fields they name; a refusal that
 * names no field of this form shows under `fallback`.
 */
export function showApiErrors<T extends FieldValues>(err: unknown, setError: UseFormSetError<T>, fallback: FieldPath<T>) {
  const fields = err instanceof ApiError ? err.fields : [];
  for (const f of fields) setError(f.path as FieldPath<T>, { message: f.message });
  if (!fields.length) setError(fallback, { message: err instanceof Error ? err.message : 'Could not save.' });
}
