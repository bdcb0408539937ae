import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton } from '@/components/form';
import { HourField } from '@/components/pickers';
import { TextField } from '@/components/text-field';
import { Button, Card, Heading } from '@/components/ui';
import { type Load, type LoadInput, loadSchema } from '@/shared/schemas/projection';
import { colors, space, type } from '@/shared/theme';

import { EssentialField } from './essential-field';

export const EMPTY_LOAD: LoadInput = { name: '', supply: 'dc', watts: 10, dutyPercent: 100, hoursPerDay: 2, startHour: 18, when: 'always', status: 'installed', quantity: 1 };

/** Add or edit a load, validated inline by the same schema the server uses. */
export function LoadForm({
  title,
  initial,
  submitLabel,
  busy,
  error,
  onSubmit,
  onCancel,
  maxWatts,
  systemVoltage = 12,
}: {
  title: string;
  initial: LoadInput;
  submitLabel: string;
  busy?: boolean;
  error?: string | null;
  onSubmit: (load: Load) => void;
  onCancel?: () => void;
  /** A sanity limit for the rig (for example what its inverter or system can feed). */
  maxWatts?: number;
  /** The rig's system voltage, for the DC choice's label. */
  systemVoltage?: number;
}) {
  const form = useForm<LoadInput, unknown, Load>({ resolver: zodResolver(loadSchema), defaultValues: initial, mode: 'onTouched' });
  const submit = form.handleSubmit((load) => {
    if (maxWatts && (load.watts ?? 0) * load.quantity > maxWatts) {
      form.setError('watts', { message: `More than this ${Math.round(maxWatts)} W system can feed; check the figure.` });
      return;
    }
    onSubmit(load);
  });
  return (
    <Form control={form.control} onSubmit={submit} busy={busy}>
    <Card testID="load-form">
      <Heading>{title}</Heading>
      <TextField control={form.control} name="name" label="Name" hint="The device, as you call it." maxLength={80} />
      <ChoiceField control={form.control} name="supply" label="Supply" options={[{ value: 'dc', label: `DC (${systemVoltage} V direct)` }, { value: 'ac', label: 'AC (through the inverter)' }]} />
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <View style={{ flex: 1, minWidth: 140 }}>
          <NumberField control={form.control} name="watts" label="Power" unit="W" />
        </View>
        <View style={{ flex: 1, minWidth: 140 }}>
          <NumberField control={form.control} name="quantity" label="How many" />
        </View>
      </View>
      <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
        <View style={{ flex: 1, minWidth: 140 }}>
          <NumberField control={form.control} name="hoursPerDay" label="Hours a day" unit="h" />
        </View>
        <View style={{ flex: 1, minWidth: 140 }}>
          <HourField control={form.control} name="startHour" label="From" hint="When it starts each day, to the hour." />
        </View>
        <View style={{ flex: 1, minWidth: 140 }}>
          <NumberField control={form.control} name="dutyPercent" label="Duty cycle" unit="%" hint="A fridge runs about 30 to 40 % of the time." />
        </View>
      </View>
      <ChoiceField control={form.control} name="when" label="Runs" options={[{ value: 'always', label: 'Any time' }, { value: 'parked', label: 'Only parked' }, { value: 'driving', label: 'Only driving' }]} />
      <EssentialField control={form.control} />
      {error ? (
        <Text role="alert" style={{ ...type.body, color: colors.short }}>
          {error}
        </Text>
      ) : null}
      <SubmitButton testID="load-submit" label={submitLabel} extra={onCancel ? <Button label="Cancel" tone="secondary" onPress={onCancel} /> : null} />
    </Card>
    </Form>
  );
}
