// Time, date-and-time and list fields bound to react-hook-form, through the platform's own pickers.
import { useId, useMemo } from 'react';
import { type Control, Controller, type FieldPath, type FieldValues } from 'react-hook-form';
import { Text, View } from 'react-native';

import { FieldNote, fieldStyles, useFormFrame } from './form-frame';
import { NativeInput, SelectInput } from './native-inputs';

type Base<T extends FieldValues> = { control: Control<T>; name: FieldPath<T>; label: string; hint?: string };

const pad = (n: number) => String(n).padStart(2, '0');
/** 18 → "18:00"; the form holds the whole hour (0 to 23). */
export const hourToTime = (h: unknown) => (typeof h === 'number' && Number.isInteger(h) ? `${pad(h)}:00` : '');
export const timeToHour = (t: string) => (/^\d{1,2}:\d{2}/.test(t) ? Number(t.split(':')[0]) : undefined);

/** A local date and time as the form holds it ("2026-12-01T18:30"). */
export function localDateTime(d: Date): string {
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

function Frame({ label, hint, error, id, children }: { label: string; hint?: string; error?: string; id: string; children: React.ReactNode }) {
  return (
    <View style={fieldStyles.field}>
      <Text nativeID={`${id}-label`} style={fieldStyles.label}>
        {label}
      </Text>
      {children}
      <FieldNote id={id} hint={hint} error={error} />
    </View>
  );
}

/** An hour of the day (the form holds 0 to 23), picked as a time; `optional` lets it be cleared. */
export function HourField<T extends FieldValues>({ control, name, label, hint }: Base<T>) {
  const id = useId();
  const frame = useFormFrame();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <Frame id={id} label={label} hint={hint} error={fieldState.error?.message}>
          <NativeInput
            kind="time"
            inputRef={field.ref}
            testID={`field-${name}`}
            value={hourToTime(field.value)}
            onChange={(t) => field.onChange(timeToHour(t))}
            onBlur={field.onBlur}
            onEnter={frame.submit}
            labelledBy={`${id}-label`}
            describedBy={fieldState.error ? `${id}-error` : hint ? `${id}-hint` : undefined}
            invalid={!!fieldState.error}
            readOnly={frame.readOnly}
          />
        </Frame>
      )}
    />
  );
}

/** A local date and time (the form holds "2026-12-01T18:30"). */
export function DateTimeField<T extends FieldValues>({ control, name, label, hint }: Base<T>) {
  const id = useId();
  const frame = useFormFrame();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <Frame id={id} label={label} hint={hint} error={fieldState.error?.message}>
          <NativeInput
            kind="datetime"
            inputRef={field.ref}
            testID={`field-${name}`}
            value={field.value ?? ''}
            onChange={field.onChange}
            onBlur={field.onBlur}
            onEnter={frame.submit}
            labelledBy={`${id}-label`}
            describedBy={fieldState.error ? `${id}-error` : hint ? `${id}-hint` : undefined}
            invalid={!!fieldState.error}
            readOnly={frame.readOnly}
          />
        </Frame>
      )}
    />
  );
}

/** The runtime's own list of time zones (IANA names), with the current value kept even if the list lacks it. */
export function timeZones(current?: string): string[] {
  let list: string[] = [];
  try {
    list = (Intl as unknown as { supportedValuesOf?: (k: string) => string[] }).supportedValuesOf?.('timeZone') ?? [];
  } catch {
    list = [];
  }
  if (!list.includes('UTC')) list = ['UTC', ...list];
  return current && !list.includes(current) ? [current, ...list] : list;
}

export function TimeZoneField<T extends FieldValues>({ control, name, label, hint }: Base<T>) {
  const id = useId();
  const frame = useFormFrame();
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <Frame id={id} label={label} hint={hint} error={fieldState.error?.message}>
          <ZoneSelect id={id} value={field.value} onChange={field.onChange} onBlur={field.onBlur} inputRef={field.ref} testID={`field-${name}`} invalid={!!fieldState.error} readOnly={frame.readOnly} />
        </Frame>
      )}
    />
  );
}

function ZoneSelect({ id, value, ...rest }: { id: string; value: string; onChange: (v: string) => void; onBlur: () => void; inputRef: (el: unknown) => void; testID: string; invalid: boolean; readOnly: boolean }) {
  const options = useMemo(() => timeZones(value).map((z) => ({ value: z, label: z.replaceAll('_', ' ') })), [value]);
  return <SelectInput {...rest} value={value} options={options} labelledBy={`${id}-label`} />;
}
