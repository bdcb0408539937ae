// Forms: a frame that submits once (the button or Enter in any field), shows every error at once, moves
// focus (and so the page) to the first and lists them all beside the button; and the number field.
// Every field has its own label (ids from useId, so two forms on one screen never share one).
import { type ReactNode, useId, useState } from 'react';
import { type Control, Controller, type FieldErrors, type FieldPath, type FieldValues, type UseFormSetError, useFormState } from 'react-hook-form';
import { StyleSheet, Text, TextInput, View } from 'react-native';

import { ApiError } from '@/lib/api-client';
import { colors, space, type } from '@/shared/theme';
import { FieldNote, fieldStyles, useFormFrame } from './form-frame';
import { Button, type ButtonTone } from './ui';

export { Form, useFormFrame } from './form-frame';
export { ChoiceField } from './chips';
export { SwitchField } from './toggle';

/** Every error message of a form, in the order the fields come. */
export function errorMessages(errors: FieldErrors): string[] {
  const out: string[] = [];
  const walk = (node: unknown) => {
    if (!node || typeof node !== 'object') return;
    const e = node as { message?: unknown; type?: unknown; ref?: unknown };
    if (typeof e.message === 'string' && e.message && (typeof e.type === 'string' || 'ref' in e)) out.push(e.message);
    for (const [k, v] of Object.entries(node)) if (k !== 'ref' && k !== 'message' && k !== 'type' && k !== 'types') walk(v);
  };
  walk(errors);
  return [...new Set(out)];
}

/** The form's button, with a short summary of what to fix above it after a submit that found errors. */
export function SubmitButton({ label, testID, tone, extra }: { label: string; testID?: string; tone?: ButtonTone; extra?: ReactNode }) {
  const frame = useFormFrame();
  if (frame.readOnly) return null;
  return (
    <View style={{ gap: space.sm }}>
      {frame.control ? <ErrorSummary control={frame.control} /> : null}
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <Button testID={testID} label={label} onPress={frame.submit} busy={frame.busy} tone={tone} />
        {extra}
      </View>
    </View>
  );
}

function ErrorSummary({ control }: { control: Control<any> }) {
  const { errors, submitCount } = useFormState({ control });
  const messages = errorMessages(errors);
  if (!submitCount || !messages.length) return null;
  return (
    <View role="alert" style={styles.summary} testID="form-error-summary">
      <Text style={styles.summaryTitle}>{messages.length === 1 ? 'One thing to fix:' : `${messages.length} things to fix:`}</Text>
      {messages.map((m) => (
        <Text key={m} style={styles.summaryItem}>
          • {m}
        </Text>
      ))}
    </View>
  );
}

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
  compact,
  toDisplay = (n) => n,
  fromDisplay = (n) => n,
}: Base<T> & { unit?: string; compact?: boolean; toDisplay?: (n: number) => number; fromDisplay?: (n: number) => number }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <NumberInput
          mount={field.ref}
          label={label}
          unit={unit}
          hint={hint}
          compact={compact}
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

function NumberInput({ mount, ...props }: { mount: (el: unknown) => void; label: string; unit?: string; hint?: string; compact?: boolean; value: number; onChange: (n: number) => void; onBlur: () => void; error?: string; testID: string }) {
  const [text, setText] = useState(Number.isFinite(props.value) ? String(props.value) : '');
  const frame = useFormFrame();
  const id = useId();
  return (
    <View style={styles.field}>
      <Text nativeID={`${id}-label`} style={styles.label}>
        {props.label}
      </Text>
      <View style={styles.row}>
        <TextInput
          ref={mount as never}
          testID={props.testID}
          aria-labelledby={`${id}-label`}
          aria-describedby={props.error ? `${id}-error` : props.hint ? `${id}-hint` : undefined}
          aria-invalid={!!props.error}
          readOnly={frame.readOnly}
          aria-readonly={frame.readOnly || undefined}
          inputMode="decimal"
          enterKeyHint="done"
          value={text}
          onChangeText={(t) => {
            setText(t);
            props.onChange(parseNumber(t));
          }}
          onBlur={props.onBlur}
          onSubmitEditing={frame.submit}
          style={[styles.input, props.compact && styles.inputCompact, frame.readOnly && styles.inputReadOnly, props.error ? styles.inputError : null]}
        />
        {props.unit ? <Text style={[styles.unit, props.compact && styles.unitCompact]}>{props.unit}</Text> : null}
      </View>
      <FieldNote id={id} hint={props.hint} error={props.error} />
    </View>
  );
}

const styles = StyleSheet.create({
  ...fieldStyles,
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  input: { ...fieldStyles.input, flex: 1, minWidth: 80 },
  inputCompact: { minWidth: 40, paddingHorizontal: space.sm },
  unit: { ...type.body, color: colors.inkSoft, minWidth: 24 },
  unitCompact: { minWidth: 0 },
  summary: { borderLeftWidth: 4, borderLeftColor: colors.short, paddingLeft: space.md, paddingVertical: space.xs, gap: 2 },
  summaryTitle: { ...type.body, color: colors.short, fontFamily: 'Nunito_700Bold' },
  summaryItem: { ...type.small, color: colors.ink },
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
