import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton } from '@/components/form';
import { TextField } from '@/components/text-field';
import { PageTitle } from '@/components/page-title';
import { Toggle } from '@/components/toggle';
import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { CONTROL_PLAIN_LABELS, controlOptions } from '@/shared/control-labels';
import type { Device } from '@/shared/devices';
import { ROUTINE_PRESETS, type RoutineKey } from '@/shared/routines';
import { type RigSetupForm, type RigSetupInput, rigSetupSchema } from '@/shared/schemas/rig';
import { colors, space, type } from '@/shared/theme';
import { useRigCreateMutation } from '../api/create-rig';
import { DevicePicker, deviceSummary } from './device-picker';
import { InverterConnectionFields } from './inverter-connection-fields';
import { DrivingFields, SHORE, ShoreFields } from './power-fields';

const INVERTER = { ratedW: 300, idleA: 0.5, efficiencyPercent: 90, control: 'always-on', connection: 'direct', socketFuseA: 15, socketSwitched: false } as const;

// Every figure here is on the page for the user to see and change; the routine has no default at all.
const defaults: RigSetupForm = {
  name: '',
  vehicle: '',
  power: {
    systemVoltage: 12,
    battery: { chemistry: 'agm', capacityAh: 100, role: 'house' },
    inverter: INVERTER,
    charging: { alternatorA: 20, charger: 'relay', solarW: 0, peakSunHours: 4, drivingMinutesPerDay: [0, 0, 0, 0, 0, 0, 0], drivingStartHour: 10 },
    plannedStayDays: 3,
  },
  loads: [],
  routine: undefined as unknown as RigSetupForm['routine'],
};

/** New rig: asks for everything the model uses (voltage, battery, inverter, charging, routine, stay) and the first devices. */
export function NewRigScreen({ onCreated }: { onCreated: (rigId: string) => void }) {
  const create = useRigCreateMutation();
  const wide = useIsWide();
  const form = useForm<RigSetupForm, unknown, RigSetupInput>({ defaultValues: defaults, mode: 'onTouched', resolver: zodResolver(rigSetupSchema) });
  const [hasInverter, setHasInverter] = useState(true);
  const [hasShore, setHasShore] = useState(false);
  const [picked, setPicked] = useState<Device[]>([]);
  const routine = useWatch({ control: form.control, name: 'routine' });
  const charger = useWatch({ control: form.control, name: 'power.charging.charger' });
  const solarW = useWatch({ control: form.control, name: 'power.charging.solarW' });
  const toggleInverter = (on: boolean) => {
    setHasInverter(on);
    form.setValue('power.inverter', on ? INVERTER : null);
    if (!on) setPicked((p) => p.filter((d) => d.load.supply === 'dc'));
  };
  const toggleShore = (on: boolean) => {
    setHasShore(on);
    form.setValue('power.charging.shore', on ? SHORE : undefined);
  };
  const startFrom = (key: RoutineKey) => {
    const preset = ROUTINE_PRESETS.find((p) => p.key === key)!;
    form.setValue('routine', key, { shouldValidate: true });
    preset.minutes.forEach((m, i) => form.setValue(`power.charging.drivingMinutesPerDay.${i}`, m));
    form.setValue('power.charging.drivingStartHour', preset.startHour);
  };
  const onSubmit = form.handleSubmit(({ routine: _routine, ...values }) => {
    create.mutate({ ...values, loads: picked.map((d) => ({ ...d.load, status: 'installed' as const, quantity: 1, dutyPercent: d.load.dutyPercent ?? 100, when: d.load.when ?? 'always' })) }, { onSuccess: (r) => onCreated(r.id) });
  });
  const col = wide ? styles.col : undefined;
  return (
    <Form control={form.control} onSubmit={onSubmit} busy={create.isPending}>
    <View style={{ gap: space.lg }} testID="new-rig-screen">
      <PageTitle parts={['New rig']} />
      <Title>New rig</Title>
      <Body>What the forecast needs to know about the vehicle. Every figure below is used as shown; change any of them now or later on Power.</Body>
      <View style={[styles.cols, wide && styles.colsWide]}>
        <Card style={col}>
          <Heading>Vehicle</Heading>
          <TextField control={form.control} name="name" label="Name" hint="What you call this vehicle." maxLength={60} />
          <TextField control={form.control} name="vehicle" label="Vehicle (optional)" hint="Its make, model or kind." maxLength={120} />
          <ChoiceField control={form.control} name="power.systemVoltage" label="System voltage" hint="6 V only on some old vehicles." options={[{ value: 12, label: '12 V' }, { value: 24, label: '24 V' }, { value: 6, label: '6 V' }]} />
        </Card>
        <Card style={col}>
          <Heading>Battery</Heading>
          <ChoiceField control={form.control} name="power.battery.role" label="Which battery" options={[{ value: 'house', label: 'A second (house) battery' }, { value: 'starter', label: 'The starting battery' }]} />
          <ChoiceField control={form.control} name="power.battery.chemistry" label="Chemistry" options={[{ value: 'flooded', label: 'Flooded lead-acid' }, { value: 'agm', label: 'AGM' }, { value: 'gel', label: 'Gel' }, { value: 'lifepo4', label: 'LiFePO4' }]} />
          <NumberField control={form.control} name="power.battery.capacityAh" label="Capacity (20-hour rate)" unit="Ah" />
        </Card>
        <Card style={col}>
          <Heading>Inverter</Heading>
          <Toggle testID="field-has-inverter" label="The rig has an inverter" value={hasInverter} onChange={toggleInverter} />
          {hasInverter ? (
            <>
              <NumberField control={form.control} name="power.inverter.ratedW" label="Rating" unit="W" />
              <NumberField control={form.control} name="power.inverter.idleA" label="Idle draw" unit="A" hint="With nothing plugged in; small inverters draw 0.2 to 0.8 A (common practice)." />
              <InverterConnectionFields control={form.control} prefix="power." />
              <ChoiceField control={form.control} name="power.inverter.control" label="Switched" options={controlOptions(CONTROL_PLAIN_LABELS)} />
            </>
          ) : (
            <Small>No inverter: only DC devices can be added.</Small>
          )}
        </Card>
        <Card style={col}>
          <Heading>Charging</Heading>
          <ChoiceField control={form.control} name="power.charging.charger" label="From the alternator through" options={[{ value: 'relay', label: 'A relay' }, { value: 'dc-dc', label: 'A DC-DC charger' }]} />
          <NumberField control={form.control} name="power.charging.alternatorA" label={charger === 'dc-dc' ? 'DC-DC charger current' : 'Charge current through the relay'} unit="A" hint={charger === 'dc-dc' ? 'Its rating: 10, 20, 30, 40 or 60 A are common.' : 'What reaches the battery while driving; 0 if it is not charged.'} />
          <NumberField control={form.control} name="power.charging.solarW" label="Solar panels" unit="W" hint="0 if none." />
          {(solarW ?? 0) > 0 ? <NumberField control={form.control} name="power.charging.peakSunHours" label="Peak sun hours" unit="h/day" hint="About 4 in a temperate summer, 1 to 2 in winter (common practice)." /> : null}
          <ShoreFields control={form.control} prefix="power." on={hasShore} onToggle={toggleShore} />
        </Card>
      </View>
      <Card testID="routine-card">
        <Heading>Routine and stay</Heading>
        <Body>How does a week&apos;s driving go? Start from the closest and adjust the minutes.</Body>
        <View style={styles.presets} role="radiogroup" aria-label="Start from">
          {ROUTINE_PRESETS.map((p) => {
            const on = routine === p.key;
            return (
              <Pressable key={p.key} role="radio" aria-checked={on} onPress={() => startFrom(p.key)} style={[styles.preset, on && styles.presetOn]} testID={`routine-${p.key}`}>
                <Text style={[styles.presetName, on && styles.presetTextOn]}>{p.name}</Text>
                <Text style={[styles.presetSummary, on && styles.presetTextOn]}>{p.summary}</Text>
              </Pressable>
            );
          })}
        </View>
        {form.formState.errors.routine ? (
          <Text role="alert" style={styles.error}>
            {form.formState.errors.routine.message}
          </Text>
        ) : null}
        {routine ? <DrivingFields control={form.control} prefix="power." /> : null}
        <NumberField control={form.control} name="power.plannedStayDays" label="Planned stay" unit="days" hint="How long you mean to stay parked; the margin is measured against it." />
      </Card>
      <Card testID="first-devices">
        <Heading>Your devices</Heading>
        {picked.length ? (
          picked.map((d) => (
            <View key={d.id} style={styles.pickedRow} testID={`picked-${d.id}`}>
              <View style={{ flex: 1 }}>
                <Text style={styles.pickedName}>{d.name}</Text>
                <Small>{deviceSummary(d)}</Small>
              </View>
              <Pressable role="button" aria-label={`Remove ${d.name}`} onPress={() => setPicked((p) => p.filter((x) => x.id !== d.id))} style={styles.remove}>
                <Text style={styles.removeText}>Remove</Text>
              </Pressable>
            </View>
          ))
        ) : (
          <Small>None yet. Add what you run from the battery; you can adjust each one in Loads.</Small>
        )}
        <DevicePicker
          actionLabel="Add"
          onPick={(d) => setPicked((p) => (p.some((x) => x.id === d.id) ? p : [...p, d]))}
          disabled={(d) => (d.load.supply === 'ac' && !hasInverter ? 'Needs an inverter.' : picked.some((x) => x.id === d.id) ? 'Added.' : null)}
        />
      </Card>
      {create.isError ? (
        <Text role="alert" style={{ ...type.body, color: colors.short }}>
          {create.error.message}
        </Text>
      ) : null}
      <SubmitButton testID="create-rig" label="Create rig and see the Outlook" />
    </View>
    </Form>
  );
}

const styles = StyleSheet.create({
  cols: { gap: space.lg },
  colsWide: { flexDirection: 'row', flexWrap: 'wrap' },
  col: { flexBasis: 420, flexGrow: 1 },
  switchRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  switchLabel: { ...type.heading, fontSize: 15, flex: 1, color: colors.ink },
  presets: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  preset: { flexBasis: 160, flexGrow: 1, borderWidth: 1, borderColor: colors.line, borderRadius: 12, padding: space.md, gap: 2, minHeight: 44 },
  presetOn: { backgroundColor: colors.night, borderColor: colors.night },
  presetName: { ...type.heading, fontSize: 15, color: colors.ink },
  presetSummary: { ...type.small, color: colors.inkSoft },
  presetTextOn: { color: colors.paper },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  pickedRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, paddingVertical: space.xs },
  pickedName: { ...type.body, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  remove: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.sm },
  removeText: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
});
