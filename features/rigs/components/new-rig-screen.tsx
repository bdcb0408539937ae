import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { useState } from 'react';
import { Pressable, Switch, Text, View } from 'react-native';

import { ChoiceField, NumberField } from '@/components/form';
import { TextField } from '@/components/text-field';
import { PageTitle } from '@/components/page-title';
import { Body, Button, Card, Heading, Title } from '@/components/ui';
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
    <View style={{ gap: space.lg }} testID="new-rig-screen">
      <PageTitle parts={['New rig']} />
      <Title>New rig</Title>
      <Body>The vehicle and its electrical system. You can change every figure later.</Body>
      <Card>
        <Heading>Vehicle</Heading>
        <TextField control={form.control} name="name" label="Name" placeholder="Wren" />
        <TextField control={form.control} name="vehicle" label="Vehicle" placeholder="Long-wheelbase panel van" />
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
        <View style={{ flexDirection: 'row', alignItems: 'center', gap: space.md }}>
          <Text style={{ ...type.heading, fontSize: 15, flex: 1, color: colors.ink }}>The rig has an inverter</Text>
          <Switch testID="field-has-inverter" aria-label="The rig has an inverter" value={hasInverter} onValueChange={toggleInverter} />
        </View>
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
            <Pressable key={c.key} role="checkbox" aria-checked={on} aria-disabled={needsInverter} disabled={needsInverter} onPress={() => tick(c.key)} testID={`tick-${c.key}`} style={{ flexDirection: 'row', gap: space.sm, alignItems: 'center', opacity: needsInverter ? 0.5 : 1 }}>
              <Text style={{ ...type.heading, color: on ? colors.night : colors.inkSoft, width: 22 }}>{on ? '☑' : '☐'}</Text>
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
      <Button testID="create-rig" label="Create rig" onPress={onSubmit} busy={create.isPending} />
    </View>
  );
}

