import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { type FieldPath, useFieldArray, useForm } from 'react-hook-form';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { ChoiceField, NumberField, showApiErrors, SwitchField } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Button, Card, Heading, Small } from '@/components/ui';
import { type Trip, type TripInput, tripSchema } from '@/shared/schemas/trip';
import { colors, space, TAP_MIN, type } from '@/shared/theme';
import type { RecentPlace } from '../api/trips';

type Path = FieldPath<TripInput>;
const at = (i: number, key: string) => `legs.${i}.${key}` as Path;
const today = () => new Date().toISOString().slice(0, 10);

export const NEW_TRIP = (): TripInput => ({
  name: '',
  startDate: today(),
  arrivalHour: 15,
  batteryInCabin: false,
  active: true,
  legs: [{ kind: 'stay', name: '', latitudeDeg: 45, nights: 3, lowC: 8, highC: 20, shore: false, sky: 'mixed' }],
});

/** The browser's location, with the person's permission (the browser asks); null where there is none. */
const geolocation = () => (typeof navigator !== 'undefined' && 'geolocation' in navigator ? navigator.geolocation : null);

/** A trip's plan: its start, and its legs in order (stays one after another; drives on their own dates). */
export function TripForm(props: { initial: TripInput; places: RecentPlace[]; busy: boolean; onSubmit: (t: Trip) => Promise<unknown>; onCancel: () => void }) {
  const form = useForm<TripInput, unknown, Trip>({ resolver: zodResolver(tripSchema), defaultValues: props.initial, mode: 'onTouched' });
  const legs = useFieldArray({ control: form.control, name: 'legs' });
  const [locating, setLocating] = useState<number | null>(null);
  const [note, setNote] = useState<string | null>(null);
  const submit = form.handleSubmit((trip) => props.onSubmit(trip).catch((err) => showApiErrors(err, form.setError, 'name')));
  const locate = (i: number) => {
    const geo = geolocation();
    if (!geo) return setNote('This browser cannot give a location: type the latitude.');
    setLocating(i);
    geo.getCurrentPosition(
      (pos) => {
        form.setValue(at(i, 'latitudeDeg'), Math.round(pos.coords.latitude * 1e4) / 1e4, { shouldValidate: true });
        if (pos.coords.altitude !== null) form.setValue(at(i, 'elevationM'), Math.round(pos.coords.altitude), { shouldValidate: true });
        setLocating(null);
        setNote(null);
      },
      () => {
        setLocating(null);
        setNote('No location was given: type the latitude instead.');
      },
      { timeout: 15_000 },
    );
  };
  return (
    <Card testID="trip-form">
      <Heading>{props.initial.name ? `Edit ${props.initial.name}` : 'Plan a trip'}</Heading>
      <TextField control={form.control} name="name" label="Trip name" placeholder="Lake week" testID="trip-name" />
      <TextField control={form.control} name="startDate" label="First day" placeholder="YYYY-MM-DD" hint="Stays follow one another from this day." testID="trip-start" />
      <NumberField control={form.control} name="arrivalHour" label="Arrive and leave at (hour)" />
      <SwitchField control={form.control} name="batteryInCabin" label="Battery inside the cabin (warmer than outside)" />
      <SwitchField control={form.control} name="active" label="Follow this trip in the Outlook and e-mails" />
      {legs.fields.map((field, i) =>
        field.kind === 'stay' ? (
          <View key={field.id} style={styles.leg} testID={`leg-${i}`}>
            <Text style={styles.legTitle}>Stay {i + 1}</Text>
            <TextField control={form.control} name={at(i, 'name')} label="Place" placeholder="The lake" testID={`leg-${i}-name`} />
            {props.places.length ? (
              <View style={styles.chips}>
                {props.places.map((p) => (
                  <Pressable
                    key={p.name}
                    role="button"
                    aria-label={`Use ${p.name}`}
                    style={styles.chip}
                    onPress={() => {
                      form.setValue(at(i, 'name'), p.name, { shouldValidate: true });
                      form.setValue(at(i, 'latitudeDeg'), p.latitudeDeg, { shouldValidate: true });
                    }}
                  >
                    <Text style={styles.chipText}>
                      {p.name} ({p.latitudeDeg.toFixed(1)}°)
                    </Text>
                  </Pressable>
                ))}
              </View>
            ) : null}
            <NumberField control={form.control} name={at(i, 'latitudeDeg')} label="Latitude (south negative)" unit="°" />
            {geolocation() ? <Button label={locating === i ? 'Finding you…' : 'Use where I am'} onPress={() => locate(i)} busy={locating === i} /> : null}
            <NumberField control={form.control} name={at(i, 'nights')} label="Nights" />
            <NumberField control={form.control} name={at(i, 'lowC')} label="Expected low" unit="°C" />
            <NumberField control={form.control} name={at(i, 'highC')} label="Expected high" unit="°C" />
            <ChoiceField control={form.control} name={at(i, 'sky')} label="Sky" options={[{ value: 'clear', label: 'Clear' }, { value: 'mixed', label: 'Mixed' }, { value: 'overcast', label: 'Overcast' }]} />
            <SwitchField control={form.control} name={at(i, 'shore')} label="Shore power" />
            <Button label="Remove this stay" onPress={() => legs.remove(i)} />
          </View>
        ) : (
          <View key={field.id} style={styles.leg} testID={`leg-${i}`}>
            <Text style={styles.legTitle}>Drive</Text>
            <TextField control={form.control} name={at(i, 'date')} label="Date" placeholder="YYYY-MM-DD" testID={`leg-${i}-date`} />
            <NumberField control={form.control} name={at(i, 'startHour')} label="From (hour)" />
            <NumberField control={form.control} name={at(i, 'minutes')} label="Minutes" />
            <Button label="Remove this drive" onPress={() => legs.remove(i)} />
          </View>
        ),
      )}
      {note ? <Small style={{ color: colors.short }}>{note}</Small> : null}
      {form.formState.errors.legs?.message || form.formState.errors.legs?.root?.message ? (
        <Text role="alert" style={styles.warning}>
          {form.formState.errors.legs?.message ?? form.formState.errors.legs?.root?.message}
        </Text>
      ) : null}
      <View style={styles.chips}>
        <Button testID="add-stay" label="Add a stay" onPress={() => legs.append({ kind: 'stay', name: '', latitudeDeg: 45, nights: 2, lowC: 8, highC: 20, shore: false, sky: 'mixed' })} />
        <Button testID="add-drive" label="Add a drive" onPress={() => legs.append({ kind: 'drive', date: form.getValues('startDate'), startHour: 10, minutes: 60 })} />
      </View>
      <View style={{ flexDirection: 'row', gap: space.md }}>
        <Button testID="trip-submit" label="Save the trip" onPress={submit} busy={props.busy} />
        <Button label="Cancel" onPress={props.onCancel} />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  leg: { gap: space.sm, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  legTitle: { ...type.heading, fontSize: 15, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: TAP_MIN, justifyContent: 'center', borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  warning: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
});
