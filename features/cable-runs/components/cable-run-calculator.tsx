import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { StyleSheet, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton, SwitchField } from '@/components/form';
import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { CircuitDrawing } from '@/components/wiring/circuit-drawing';
import type { CableRunResult } from '@/shared/energy/wiring';
import { CABLE_TYPES, CIRCUIT_LABELS as L, CIRCUIT_ROUTES, RETURN_OPTIONS, type CircuitForm, type CircuitInput, circuitSchema, circuitToRun } from '@/shared/schemas/circuit';
import { colors, radius, space, type } from '@/shared/theme';
import { useCableRunSizeMutation } from '../api/size-cable-run';

const defaults: CircuitForm = {
  systemVoltage: 12,
  end: 'device',
  currentA: 25,
  inverterW: 300,
  efficiencyPercent: 90,
  route: 'cabin',
  cableType: 'xlpe',
  lengthM: 2.5,
  critical: true,
  returnPath: 'cable',
  continuous: false,
};

/** Wire a circuit: start from what is at the end of the wire, say where it runs and in what cable, get it drawn. */
export function CableRunCalculator() {
  const wide = useIsWide();
  const mutation = useCableRunSizeMutation();
  const [sized, setSized] = useState<CircuitInput | null>(null);
  const form = useForm<CircuitForm, unknown, CircuitInput>({ resolver: zodResolver(circuitSchema), defaultValues: defaults, mode: 'onTouched' });
  const end = useWatch({ control: form.control, name: 'end' });
  const onSubmit = form.handleSubmit((values) => {
    setSized(values);
    mutation.mutate(circuitToRun(values));
  });

  return (
    <Form control={form.control} onSubmit={onSubmit} busy={mutation.isPending}>
    <View style={styles.root} testID="cable-run-calculator">
      <Title>Wire a circuit</Title>
      <Body>Start from what is at the end of the wire; Keyoff sizes the cable and the fuse at the battery and draws the circuit.</Body>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <Card style={wide ? styles.col : undefined}>
          <ChoiceField control={form.control} name="end" label={L.end} options={[{ value: 'device', label: 'A device (its current)' }, { value: 'inverter', label: 'An inverter (its watts)' }]} />
          {end === 'inverter' ? (
            <NumberField control={form.control} name="inverterW" label="Inverter's rated output" unit="W" hint="Its feed is sized at full output near the 10.5 V cut-out, as a continuous load." />
          ) : (
            <NumberField control={form.control} name="currentA" label={L.current} unit="A" hint="The most it draws from the battery." />
          )}
          <ChoiceField control={form.control} name="route" label={L.route} options={Object.entries(CIRCUIT_ROUTES).map(([value, r]) => ({ value: value as CircuitInput['route'], label: r.label }))} hint={L.routeHint} />
          <ChoiceField control={form.control} name="cableType" label={L.cableType} options={Object.entries(CABLE_TYPES).map(([value, c]) => ({ value: value as CircuitInput['cableType'], label: `${c.label}, ${c.insulationC} °C` }))} />
          <NumberField control={form.control} name="lengthM" label={L.length} unit="m" hint={L.lengthHint} />
          <ChoiceField control={form.control} name="returnPath" label={L.return} options={RETURN_OPTIONS} />
          {end === 'inverter' ? null : (
            <>
              <SwitchField control={form.control} name="critical" label="Electronics or a feed: keep the drop within 3 % (else 10 %)" />
              <SwitchField control={form.control} name="continuous" label={L.continuous} />
            </>
          )}
          <ChoiceField control={form.control} name="systemVoltage" label="System voltage" options={[{ value: 12, label: '12 V' }, { value: 24, label: '24 V' }]} />
          <SubmitButton testID="size-run" label="Wire it" />
          {mutation.isError ? (
            <Text role="alert" style={styles.error}>
              {mutation.error.message}
            </Text>
          ) : null}
        </Card>
        <View style={[styles.col, { gap: space.lg }]}>
          {mutation.data && sized ? <Result result={mutation.data} circuit={sized} /> : <Card><Small>Describe the circuit and press “Wire it”.</Small></Card>}
        </View>
      </View>
    </View>
    </Form>
  );
}

function Result({ result, circuit }: { result: CableRunResult; circuit: CircuitInput }) {
  const run = circuitToRun(circuit);
  return (
    <>
      <Card>
        <Heading>The circuit</Heading>
        <CircuitDrawing
          testID="circuit-drawing"
          size={`${result.awg} AWG (${result.mm2} mm²)`}
          lengthM={circuit.lengthM}
          dropPercent={result.dropPercent}
          allowedDropPercent={run.maxDropPercent}
          fuseA={result.fuseA}
          device={circuit.end === 'inverter' ? `${circuit.inverterW} W inverter` : `${run.currentA} A device`}
          returnPath={circuit.returnPath}
        />
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
