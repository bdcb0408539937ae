import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { ChoiceField, Form, NumberField, showApiErrors, SubmitButton, SwitchField } from '@/components/form';
import { DateTimeField, localDateTime } from '@/components/pickers';
import { TextField } from '@/components/text-field';
import { Card, Heading } from '@/components/ui';
import { type ReadingForm, readingSchema } from '@/shared/schemas/reading';
import { useSpotReadingMutation } from '../api/readings';

const spotForm = readingSchema.extend({ at: z.string().min(1, 'When: pick the date and time of the reading.') });
type SpotForm = z.input<typeof spotForm>;

const localNow = () => localDateTime(new Date());

/** A reading typed in. After a save the form starts over (Rested off): the next reading is rarely rested too. */
export function SpotReadingCard({ rigId }: { rigId: string }) {
  const save = useSpotReadingMutation(rigId);
  const { control, handleSubmit, reset, setError } = useForm<SpotForm>({
    resolver: zodResolver(spotForm),
    defaultValues: { at: localNow(), voltageV: Number.NaN, rested: false, place: 'terminals', note: '' },
  });
  const submit = handleSubmit(async (v) => {
    // Without a zone the browser reads it as local time, as the label says.
    const at = new Date(v.at);
    if (Number.isNaN(at.getTime())) return setError('at', { message: 'When: pick the date and time of the reading.' });
    try {
      await save.mutateAsync({ ...(v as ReadingForm), at: at.toISOString() });
      reset({ at: localNow(), voltageV: Number.NaN, currentA: undefined, rested: false, place: v.place, note: '' });
    } catch (err) {
      showApiErrors(err, setError, 'note');
    }
  });
  return (
    <Form control={control} onSubmit={submit} busy={save.isPending}>
    <Card testID="spot-form">
      <Heading>Add a reading</Heading>
      <DateTimeField control={control} name="at" label="When (your local time)" />
      <NumberField control={control} name="voltageV" label="Battery voltage" unit="V" />
      <NumberField control={control} name="currentA" label="Current (optional, + when drawn)" unit="A" />
      <SwitchField control={control} name="rested" label="Rested" hint="No charging and nothing switched on for two hours or more: no more than a trickle flowing." />
      <ChoiceField
        control={control}
        name="place"
        label="Measured at"
        options={[
          { value: 'terminals', label: 'Battery posts' },
          { value: 'device', label: 'A device' },
          { value: 'ground', label: 'A ground point' },
        ]}
      />
      <TextField control={control} name="note" label="Note (optional)" maxLength={500} />
      <SubmitButton label="Save reading" testID="save-reading" />
    </Card>
    </Form>
  );
}
