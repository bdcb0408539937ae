import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useState } from 'react';
import { Pressable, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Toggle } from '@/components/toggle';
import { Body, Card, Heading, Title } from '@/components/ui';
import { type RigCreateForm, type RigCreateInput, rigCreateSchema } from '@/shared/schemas/rig';
import { colors, space, type } from '@/shared/theme';
import { useRigCreateMutation } from '../api/create-rig';
import { COMMON_LOADS } from '../utils/common-loads';

const INVERTER = { ratedW: 300, idleA: 0.5, control: 'always-on' } as const;

const defaults: RigCreateForm = {
  name: '',
  vehicle: '',
  power: {
    systemVoltage: 12,
    battery: { chemistry: 'agm', capacityAh: 100, role: 'house' },
    inverter: INVERTER,
    charging: { alternatorA: 20, drivingMinutesPerDay: [30, 30, 30, 30, 30, 60, 60] },
    plannedStayDays: 3,
  },
  loads: [],
};

/** A new rig: vehicle, battery, inverter and charging, each field with its unit and a sensible default. */
export function NewRigScreen({ onCreated }: { onCreated: (rigId: string) => void }) {
  const create = useRigCreateMutation();
  const form = useForm<RigCreateForm, unknown, RigCreateInput>({ defaultValues: defaults, mode: 'onTouched', resolver: zodResolver(rigCreateSchema) });
  const [hasInverter, setHasInverter] = useState(true);
  const [ticked, setTicked] = useState<Set<string>>(new Set(['fridge', 'lights', 'phones']));
  const tick = (key: string) => setTicked((t) => new Set(t.has(key) ? [...t].filter((k) => k !== key) : [...t, key]));
  const toggleInverter = (on: boolean) => {
    setHasInverter(on);
    form.setValue('power.inverter', on ? INVERTER : null);
  };
  const onSubmit = form.handleSubmit((values) => {
    const loads = COMMON_LOADS.filter((c) => ticked.has(c.key) && (hasInverter || c.load.supply === 'dc')).map((c) => c.load);
    create.mutate({ ...values, loads }, { onSuccess: (r) => onCreated(r.id) });
  });
  return (
    <Form control={form.control} onSubmit={onSubmit} busy={create.isPending}>
    <View style={{ gap: space.lg }} testID="new-rig-screen">
      <Title>New rig</Title>
      <Body>The vehicle and its electrical system. You can change every figure later.</Body>
      <Card>
        <Heading>Vehicle</Heading>
        <TextField control={form.control} name="name" label="Name" hint="What you call this vehicle." maxLength={60} />
        <TextField control={form.control} name="vehicle" label="Vehicle (optional)" hint="Its make, model or kind." maxLength={120} />
      </Card>
      <Card>
        <Heading>Battery</Heading>
        <ChoiceField
          control={form.control}
          name="power.battery.chemistry"
          label="Chemistry"
          options={[
            { value: 'flooded', label: 'Flooded lead-acid' },
            { value: 'agm', label: 'AGM' },
            { value: 'gel', label: 'Gel' },
            { value: 'lifepo4', label: 'LiFePO4' },
          ]}
        />
        <NumberField control={form.control} name="power.battery.capacityAh" label="Capacity (20-hour rate)" unit="Ah" />
        <ChoiceField control={form.control} name="power.battery.role" label="Battery" options={[{ value: 'house', label: 'Second (house) battery' }, { value: 'starter', label: 'The starting battery' }]} />
      </Card>
      <Card>
        <Heading>Inverter</Heading>
        <Toggle testID="field-has-inverter" label="The rig has an inverter" value={hasInverter} onChange={toggleInverter} />
        {hasInverter ? (
          <>
            <NumberField control={form.control} name="power.inverter.ratedW" label="Rating" unit="W" />
            <NumberField control={form.control} name="power.inverter.idleA" label="Idle draw" unit="A" hint="With nothing plugged in; small inverters draw 0.2 to 0.8 A." />
            <ChoiceField
              control={form.control}
              name="power.inverter.control"
              label="How it is switched"
              options={[
                { value: 'always-on', label: 'Always on' },
                { value: 'manual-switch', label: 'Manual switch' },
                { value: 'ignition-relay', label: 'Ignition relay' },
                { value: 'low-voltage-disconnect', label: 'Low-voltage disconnect' },
              ]}
            />
          </>
        ) : null}
      </Card>
      <Card>
        <Heading>Charging and stay</Heading>
        <NumberField control={form.control} name="power.charging.alternatorA" label="Alternator charge current" unit="A" hint="Through a relay or a DC-DC charger." />
        <NumberField control={form.control} name="power.plannedStayDays" label="Planned stay" unit="days" />
      </Card>
      <Card>
        <Heading>Common loads</Heading>
        <Body>Tick what you use; you can change each one in Loads.</Body>
        {COMMON_LOADS.map((c) => {
          const on = ticked.has(c.key);
          const needsInverter = c.load.supply === 'ac' && !hasInverter;
          return (
            <Pressable key={c.key} role="checkbox" aria-checked={on} aria-disabled={needsInverter} disabled={needsInverter} onPress={() => tick(c.key)} testID={`tick-${c.key}`} style={{ flexDirection: 'row', gap: space.sm, alignItems: 'center', minHeight: 44, opacity: needsInverter ? 0.6 : 1 }}>
              <Text aria-hidden style={{ ...type.title, color: on ? colors.night : colors.inkSoft, width: 32, textAlign: 'center' }}>{on ? '☑' : '☐'}</Text>
              <Text style={{ ...type.body, color: colors.ink, flex: 1 }}>
                {c.label}
                {needsInverter ? ' (needs an inverter)' : ''}
              </Text>
            </Pressable>
          );
        })}
      </Card>
      {create.isError ? (
        <Text role="alert" style={{ ...type.body, color: colors.short }}>
          {create.error.message}
        </Text>
      ) : null}
      <SubmitButton testID="create-rig" label="Create rig" />
    </View>
    </Form>
  );
}

