// Power-system fields that New rig and Power both show: the week's driving, shore power and its days.
// `prefix` is where the power system sits in the form ('' on Power, 'power.' in New rig).
import { type Control, Controller, type FieldPath, type FieldValues, useWatch } from 'react-hook-form';
import { Pressable, StyleSheet, Switch, Text, View } from 'react-native';

import { NumberField } from '@/components/form';
import { HourField } from '@/components/pickers';
import { Small } from '@/components/ui';
import { routineOf } from '@/shared/routines';
import { colors, space, type } from '@/shared/theme';

export const DAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];
export const SHORE = { amps: 15, hoursPerDay: 12, startHour: 18, weekdays: [0, 1, 2, 3, 4, 5, 6] };

type Props<T extends FieldValues> = { control: Control<T>; prefix: '' | 'power.' };
const at = <T extends FieldValues>(prefix: string, path: string) => `${prefix}${path}` as FieldPath<T>;

/** Minutes of driving on each day of the week and the hour the day's driving starts. */
export function DrivingFields<T extends FieldValues>({ control, prefix }: Props<T>) {
  const minutes = useWatch({ control, name: at<T>(prefix, 'charging.drivingMinutesPerDay') }) as number[] | undefined;
  const start = useWatch({ control, name: at<T>(prefix, 'charging.drivingStartHour') }) as number | undefined;
  const ok = Array.isArray(minutes) && minutes.length === 7 && minutes.every(Number.isFinite) && Number.isFinite(start);
  return (
    <>
      {ok ? (
        <Text style={styles.routine} testID="routine-name">
          {routineOf({ drivingMinutesPerDay: minutes, drivingStartHour: start! }).name}
        </Text>
      ) : null}
      <Small>Minutes of driving each day.</Small>
      <View style={styles.days}>
        {DAYS.map((d, i) => (
          <View key={d} style={{ flexBasis: 104, flexGrow: 1, maxWidth: 140 }}>
            <NumberField compact control={control} name={at<T>(prefix, `charging.drivingMinutesPerDay.${i}`)} label={d} unit="min" />
          </View>
        ))}
      </View>
      <HourField control={control} name={at<T>(prefix, 'charging.drivingStartHour')} label="Driving starts at" />
    </>
  );
}

/** Shore power: a charger on a hook-up, its current, hours a day and which days. Off means none. */
export function ShoreFields<T extends FieldValues>({ control, prefix, on, onToggle, disabled }: Props<T> & { on: boolean; onToggle: (on: boolean) => void; disabled?: boolean }) {
  return (
    <View style={{ gap: space.sm }} testID="shore-fields">
      <View style={styles.switchRow}>
        <Text style={styles.label}>Shore power (a mains hook-up and charger)</Text>
        <Switch testID="field-has-shore" aria-label="Shore power" value={on} onValueChange={onToggle} disabled={disabled} />
      </View>
      {on ? (
        <>
          <NumberField control={control} name={at<T>(prefix, 'charging.shore.amps')} label="Charger current" unit="A" hint="What the mains charger gives the battery." />
          <NumberField control={control} name={at<T>(prefix, 'charging.shore.hoursPerDay')} label="Hooked up" unit="h/day" />
          <NumberField control={control} name={at<T>(prefix, 'charging.shore.startHour')} label="From" unit="h" hint="Hour of day, 0 to 23." />
          <DaysField control={control} name={at<T>(prefix, 'charging.shore.weekdays')} label="On these days" />
        </>
      ) : (
        <Small>No shore power: the battery charges only from driving and solar.</Small>
      )}
    </View>
  );
}

/** Days of the week as toggles; the form holds the chosen weekdays (0 = Monday) in order. */
export function DaysField<T extends FieldValues>({ control, name, label }: { control: Control<T>; name: FieldPath<T>; label: string }) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => {
        const days: number[] = Array.isArray(field.value) ? field.value : [];
        const toggle = (i: number) => field.onChange(days.includes(i) ? days.filter((x) => x !== i) : [...days, i].sort((a, b) => a - b));
        return (
          <View style={{ gap: space.xs }} role="group" aria-label={label}>
            <Text style={styles.label}>{label}</Text>
            <View style={styles.days}>
              {DAYS.map((d, i) => {
                const sel = days.includes(i);
                return (
                  <Pressable key={d} role="checkbox" aria-checked={sel} onPress={() => toggle(i)} style={[styles.chip, sel && styles.chipOn]} testID={`${`field-${name}`}-${i}`}>
                    <Text style={[styles.chipText, sel && styles.chipTextOn]}>{d}</Text>
                  </Pressable>
                );
              })}
            </View>
            {fieldState.error ? <Text role="alert" style={styles.error}>{fieldState.error.message}</Text> : null}
          </View>
        );
      }}
    />
  );
}

const styles = StyleSheet.create({
  days: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  label: { ...type.heading, fontSize: 15, flex: 1, color: colors.ink },
  chip: { borderWidth: 1, borderColor: colors.line, borderRadius: 999, minHeight: 44, minWidth: 52, alignItems: 'center', justifyContent: 'center', paddingHorizontal: space.sm },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  routine: { ...type.body, color: colors.ink, fontFamily: 'Nunito_700Bold' },
});
