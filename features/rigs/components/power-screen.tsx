import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton } from '@/components/form';
import { Toggle } from '@/components/toggle';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { cToF, fToC, useUnits } from '@/components/units';
import { useIsWide } from '@/components/use-layout';
import { ApiError } from '@/lib/api-client';
import { CONTROL_LABELS, controlOptions } from '@/shared/control-labels';
import { type RigPower, type RigPowerInput, rigPowerSchema } from '@/shared/schemas/projection';
import { colors, space, type } from '@/shared/theme';
import { useRouter } from 'expo-router';

import { type Rig, useRigDeleteMutation, useRigQuery, useRigUpdateMutation } from '../api/rig';
import { SelfHeatingFields } from './self-heating-fields';
import { InverterConnectionFields } from './inverter-connection-fields';
import { DrivingFields, SHORE, ShoreFields } from './power-fields';
const INVERTER = { ratedW: 300, efficiencyPercent: 90, idleA: 0.5, control: 'always-on' } as const;

/** Power: battery bank, inverter and its control, charging, the weekly routine, the stay and the horizon. */
export function PowerScreen({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  if (rig.isPending) return <ActivityIndicator color={colors.night} />;
  if (rig.isError) return <Body style={{ color: colors.short }}>{rig.error.message}</Body>;
  return <PowerForm key={rig.data.version} rig={rig.data} />;
}

function PowerForm({ rig }: { rig: Rig }) {
  const wide = useIsWide();
  const { units } = useUnits();
  const update = useRigUpdateMutation(rig.id);
  const readOnly = !rig.permissions.edit;
  const form = useForm<RigPowerInput, unknown, RigPower>({ resolver: zodResolver(rigPowerSchema), defaultValues: rig.power, mode: 'onTouched' });
  const [hasInverter, setHasInverter] = useState(rig.power.inverter !== null);
  const [hasShore, setHasShore] = useState(!!rig.power.charging.shore);
  const toggleShore = (on: boolean) => {
    setHasShore(on);
    form.setValue('charging.shore', on ? SHORE : undefined);
  };
  const toggle = (on: boolean) => {
    setHasInverter(on);
    form.setValue('inverter', on ? INVERTER : null);
  };
  const save = form.handleSubmit((power) => update.mutate({ version: rig.version, power }));
  const conflict = update.error instanceof ApiError && update.error.status === 409;
  const col = wide ? { flex: 1 } : undefined;
  return (
    <Form control={form.control} onSubmit={save} busy={update.isPending} readOnly={readOnly}>
    <View style={{ gap: space.lg }} testID="power-screen">
      {readOnly ? <Small testID="power-read-only">You can read the power system; only an owner changes it.</Small> : null}
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <Card style={col}>
          <Heading>Battery bank</Heading>
          <ChoiceField control={form.control} name="battery.chemistry" label="Chemistry" options={[{ value: 'flooded', label: 'Flooded' }, { value: 'agm', label: 'AGM' }, { value: 'gel', label: 'Gel' }, { value: 'lifepo4', label: 'LiFePO4' }]} />
          <NumberField control={form.control} name="battery.capacityAh" label="Capacity (20-hour rate)" unit="Ah" />
          <NumberField control={form.control} name="battery.healthPercent" label="Health" unit="%" hint="An older battery holds less: 80 % after a few years is common." />
          <NumberField
            key={units.temperature}
            control={form.control}
            name="battery.temperatureC"
            label="Battery temperature"
            unit={units.temperature === 'F' ? '°F' : '°C'}
            toDisplay={units.temperature === 'F' ? cToF : undefined}
            fromDisplay={units.temperature === 'F' ? fToC : undefined}
            hint="Cold batteries hold less: about 75 % of their capacity at 0 °C (32 °F)."
          />
          <NumberField control={form.control} name="battery.startSocPercent" label="Charge at the start" unit="%" />
          <SelfHeatingFields control={form.control} />
          <ChoiceField control={form.control} name="battery.role" label="Battery" options={[{ value: 'house', label: 'House battery' }, { value: 'starter', label: 'Starting battery' }]} />
          <NumberField control={form.control} name="systemVoltage" label="System voltage" unit="V" />
        </Card>
        <Card style={col}>
          <Heading>Inverter and standby</Heading>
          <Toggle testID="field-has-inverter" label="The rig has an inverter" value={hasInverter} onChange={toggle} disabled={readOnly} />
          {hasInverter ? (
            <>
              <NumberField control={form.control} name="inverter.ratedW" label="Rating" unit="W" />
              <NumberField control={form.control} name="inverter.idleA" label="Idle draw" unit="A" />
              <NumberField control={form.control} name="inverter.efficiencyPercent" label="Efficiency" unit="%" />
              <InverterConnectionFields control={form.control} prefix="" />
              <ChoiceField
                control={form.control}
                name="inverter.control"
                label="How it is switched"
                options={controlOptions(CONTROL_LABELS)}
              />
            </>
          ) : null}
          <NumberField control={form.control} name="keyOffDrawA" label="Vehicle key-off draw on this battery" unit="A" hint="Clock, alarm and modules; 0 if they are on another battery." />
        </Card>
      </View>
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <Card style={col}>
          <Heading>Charging</Heading>
          <NumberField control={form.control} name="charging.alternatorA" label="Alternator charge current" unit="A" />
          <ChoiceField
            control={form.control}
            name="charging.charger"
            label="Through"
            options={[{ value: 'relay', label: 'A relay' }, { value: 'dc-dc', label: 'A DC-DC charger' }]}
            hint="A relay joins a few minutes into each drive and the battery takes what it accepts; a DC-DC charger gives its rated current until nearly full."
          />
          <NumberField control={form.control} name="charging.solarW" label="Solar panels" unit="W" />
          <NumberField control={form.control} name="charging.peakSunHours" label="Peak sun hours" unit="h/day" />
          <ShoreFields control={form.control} prefix="" on={hasShore} onToggle={toggleShore} disabled={readOnly} />
        </Card>
        <Card style={col}>
          <Heading>Routine and stay</Heading>
          <DrivingFields control={form.control} prefix="" />
          <NumberField control={form.control} name="plannedStayDays" label="Planned stay" unit="days" />
          <NumberField control={form.control} name="horizonDays" label="Horizon" unit="days" hint="1 to 60 days." />
        </Card>
      </View>
      {update.isError ? (
        <Text role="alert" style={{ ...type.body, color: colors.short }} testID="power-error">
          {conflict ? 'Someone else changed this rig while you were editing. Reload the page to see their change, then make yours again.' : update.error.message}
        </Text>
      ) : null}
      {update.isSuccess ? <Text style={{ ...type.body, color: colors.comfortable }}>Saved. The Outlook is updated.</Text> : null}
      <SubmitButton testID="power-save" label="Save the power system" />
      {rig.permissions.delete ? <DeleteRig rig={rig} /> : null}
    </View>
    </Form>
  );
}

function DeleteRig({ rig }: { rig: Rig }) {
  const [asking, setAsking] = useState(false);
  const remove = useRigDeleteMutation(rig.id);
  const router = useRouter();
  return (
    <Card>
      <Heading>Delete this rig</Heading>
      <Small>Deletes {rig.name} with all its loads for everyone in the household. This cannot be undone.</Small>
      {asking ? (
        <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
          <Button tone="danger" testID="confirm-delete-rig" label={`Yes, delete ${rig.name}`} onPress={() => remove.mutate(undefined, { onSuccess: () => router.replace('/') })} busy={remove.isPending} />
          <Button tone="secondary" label="Keep it" onPress={() => setAsking(false)} />
        </View>
      ) : (
        <Button tone="danger" testID="delete-rig" label="Delete rig…" onPress={() => setAsking(true)} />
      )}
      {remove.isError ? <Text role="alert" style={{ ...type.body, color: colors.short }}>{remove.error.message}</Text> : null}
    </Card>
  );
}
