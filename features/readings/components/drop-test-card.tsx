import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Text, View } from 'react-native';
import { z } from 'zod';

import { ChoiceField, Form, NumberField, SubmitButton } from '@/components/form';
import { Body, Card, Heading, Small } from '@/components/ui';
import { voltageDropSchema, type VoltageDropForm } from '@/shared/schemas/reading';
import { colors, type } from '@/shared/theme';
import { useVoltageDropMutation } from '../api/readings';
import { styles } from './styles';

export function DropTestCard({ rigId, cableRuns }: { rigId: string; cableRuns: { id: string; label: string }[] }) {
  const test = useVoltageDropMutation(rigId);
  const { control, handleSubmit } = useForm<VoltageDropForm & { run: string }>({
    resolver: zodResolver(voltageDropSchema.extend({ run: z.string() })) as never,
    defaultValues: { batteryV: Number.NaN, pointV: Number.NaN, currentA: Number.NaN, run: '' },
  });
  const submit = handleSubmit((v) => test.mutate({ batteryV: v.batteryV, pointV: v.pointV, currentA: v.currentA, ...(v.run ? { cableRunId: v.run } : {}) }));
  return (
    <Form control={control} onSubmit={submit} busy={test.isPending}>
    <Card testID="drop-test">
      <Heading>Voltage-drop test</Heading>
      <Small>With a known current flowing (the device on), measure at the battery posts and at the device or its ground point.</Small>
      <NumberField control={control} name="batteryV" label="At the battery" unit="V" />
      <NumberField control={control} name="pointV" label="At the device or ground point" unit="V" />
      <NumberField control={control} name="currentA" label="Current flowing" unit="A" />
      {cableRuns.length ? <ChoiceField control={control} name="run" label="Cable run" options={[{ value: '', label: 'None' }, ...cableRuns.map((r) => ({ value: r.id, label: r.label }))]} /> : null}
      <SubmitButton label="Check the connection" testID="run-drop-test" />
      {test.data ? (
        <View role="status" style={{ gap: 2 }}>
          {test.data.verdict ? (
            <Text testID="drop-verdict" style={{ ...type.heading, color: test.data.verdict.within ? colors.comfortable : colors.short }}>
              {test.data.verdict.within ? '✓ Within its limit. ' : '▲ Over its limit. '}
              {test.data.verdict.message}
            </Text>
          ) : null}
          <Body style={test.data.flagged ? { color: colors.short } : undefined}>{test.data.message}</Body>
          <Small>
            {test.data.dropV} V · {test.data.dropPercent} % · {test.data.resistanceOhm} Ω
          </Small>
        </View>
      ) : null}
      {test.error ? <Text role="alert" style={styles.error}>{test.error.message}</Text> : null}
    </Card>
    </Form>
  );
}
