import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { StyleSheet, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton, SwitchField } from '@/components/form';
import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import type { CableRunResult } from '@/shared/energy/wiring';
import { type CableRunSizeForm, type CableRunSizeInput, cableRunSizeSchema } from '@/shared/schemas/cable-run';
import { colors, radius, space, type } from '@/shared/theme';
import { useCableRunSizeMutation } from '../api/size-cable-run';

const defaults: CableRunSizeForm = {
  systemVoltage: 12,
  currentA: 25,
  lengthM: 2.5,
  maxDropPercent: 3,
  insulationC: 105,
  engineSpace: false,
  returnPath: 'cable',
  continuous: false,
  purpose: 'inverter',
};

/** The standalone cable-run calculator: one run from the battery to a device. */
export function CableRunCalculator() {
  const wide = useIsWide();
  const mutation = useCableRunSizeMutation();
  const form = useForm<CableRunSizeForm, unknown, CableRunSizeInput>({ resolver: zodResolver(cableRunSizeSchema), defaultValues: defaults, mode: 'onTouched' });
  const onSubmit = form.handleSubmit((values) => mutation.mutate(values));

  return (
    <Form control={form.control} onSubmit={onSubmit} busy={mutation.isPending}>
    <View style={styles.root} testID="cable-run-calculator">
      <Title>Cable run</Title>
      <Body>Size the wire and the fuse or breaker for one circuit from the battery to a device.</Body>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <Card style={wide ? styles.col : undefined}>
          <ChoiceField control={form.control} name="systemVoltage" label="System voltage" options={[{ value: 12, label: '12 V' }, { value: 24, label: '24 V' }]} />
          <NumberField control={form.control} name="currentA" label="Current" unit="A" hint="The most the device draws from the battery." />
          <NumberField control={form.control} name="lengthM" label="Length, one way" unit="m" hint="From the battery to the device." />
          <NumberField control={form.control} name="maxDropPercent" label="Allowed voltage drop" unit="%" hint="3 % for electronics and feeds, 10 % for non-critical loads (ABYC E-11)." />
          <ChoiceField
            control={form.control}
            name="insulationC"
            label="Insulation rating"
            options={[60, 75, 90, 105, 125].map((t) => ({ value: t, label: `${t} °C` }))}
          />
          <ChoiceField control={form.control} name="returnPath" label="Return path" options={[{ value: 'cable', label: 'Negative cable' }, { value: 'chassis', label: 'Through the chassis' }]} />
          <SwitchField control={form.control} name="engineSpace" label="Runs through the engine space" />
          <SwitchField control={form.control} name="continuous" label="Continuous load (3 hours or more)" />
          <ChoiceField control={form.control} name="purpose" label="What it feeds" options={[{ value: 'general', label: 'A device' }, { value: 'inverter', label: 'An inverter' }]} />
          <SubmitButton testID="size-run" label="Size this run" />
          {mutation.isError ? (
            <Text role="alert" style={styles.error}>
              {mutation.error.message}
            </Text>
          ) : null}
        </Card>
        <View style={[styles.col, { gap: space.lg }]}>
          {mutation.data ? <Result result={mutation.data} /> : <Card><Small>Enter the run and press “Size this run”.</Small></Card>}
        </View>
      </View>
    </View>
    </Form>
  );
}

function Result({ result }: { result: CableRunResult }) {
  return (
    <>
      <Card>
        <Heading>Conductor</Heading>
        <View style={styles.figures}>
          <Figure label="AWG" value={result.awg} testID="result-awg" />
          <Figure label="mm²" value={String(result.mm2)} testID="result-mm2" />
          <Figure label="Fuse or breaker" value={`${result.fuseA} A`} testID="result-fuse" />
        </View>
        <Body>
          Drop {result.dropV.toFixed(2)} V ({result.dropPercent.toFixed(1)} %) over {result.conductorLengthM} m of conductor; the wire carries up to {Math.round(result.ampacityA)} A.
        </Body>
        {result.nextSmaller ? (
          <Small>
            The next size down, {result.nextSmaller.awg} AWG, would drop {result.nextSmaller.dropPercent.toFixed(1)} % and fails on {result.nextSmaller.fails.join(' and ')}.
          </Small>
        ) : null}
        <Small>
          {result.fuseKind}; protection between {result.protection.minimumA} A and {result.protection.maximumA} A. {result.protection.placement}
        </Small>
        <Small>
          Breaker: {result.breaker.type} ({result.breaker.standard}). {result.breaker.advice}
        </Small>
      </Card>
      <View style={styles.safety} role="note" testID="cautions">
        <Heading>Before you wire it</Heading>
        {result.cautions.map((c) => (
          <Small key={c} style={{ color: colors.ink }}>
            • {c}
          </Small>
        ))}
      </View>
    </>
  );
}

function Figure({ label, value, testID }: { label: string; value: string; testID: string }) {
  return (
    <View style={styles.figure}>
      <Text style={styles.figureValue} testID={testID}>
        {value}
      </Text>
      <Text style={styles.figureLabel}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  col: { flex: 1 },
  figures: { flexDirection: 'row', gap: space.xl, flexWrap: 'wrap' },
  figure: { gap: 2 },
  figureValue: { ...type.figure, color: colors.night },
  figureLabel: { ...type.small, color: colors.inkSoft },
  error: { ...type.body, color: colors.short },
  safety: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
});
