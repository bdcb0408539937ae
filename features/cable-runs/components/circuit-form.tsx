import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { type Resolver, useForm } from 'react-hook-form';
import { StyleSheet, Text } from 'react-native';

import { ChipGroup } from '@/components/chips';
import { ChoiceField, Form, NumberField, SubmitButton, SwitchField } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Button, Card, Heading, Small } from '@/components/ui';
import { type CableRunFields, type CableRunForm, type CableRunInput, cableRunSchema } from '@/shared/schemas/cable-run';
import { CABLE_TYPE_OPTIONS, CIRCUIT_LABELS as L, type CircuitForm as CalculatorForm, type CircuitInput, circuitSchema, RETURN_OPTIONS, ROUTE_OPTIONS } from '@/shared/schemas/circuit';
import { colors, type } from '@/shared/theme';

/** What is at the end of the wire: a device's current, one of the rig's loads, or an inverter. */
export type CircuitSource = 'current' | 'load' | 'inverter';

/** Every field either variant can hold: the circuit's own (cableRunFields) and each variant's few extras. */
type Values = CableRunFields & Partial<Omit<CalculatorForm, keyof CableRunFields>> & Partial<Omit<CableRunForm, keyof CableRunFields>>;

type Common = { busy: boolean; error?: string; heading?: string };
/** Wire a circuit: answers without saving; it has no rig, so it asks the system voltage and an inverter's watts. */
type CalculatorProps = Common & { variant: 'calculator'; initial: CalculatorForm; onSubmit: (circuit: CircuitInput) => void };
/** A rig's saved run: adds a name, the rig's loads and inverter as sources, and Save and Cancel. */
type SavedProps = Common & {
  variant: 'saved';
  initial: CableRunForm;
  loads: { value: string; label: string }[];
  hasInverter: boolean;
  onSubmit: (run: CableRunInput) => void;
  onCancel: () => void;
};

/** The sizes offered for a wire already fitted (the schema takes every size of the table). */
const FITTED_AWG = ['16', '14', '12', '10', '8', '6', '4', '2'] as const;

const sourceOf = (v: Values): CircuitSource => (v.loadId !== undefined ? 'load' : v.inverterLink || v.end === 'inverter' ? 'inverter' : 'current');

/**
 * The one circuit form, for Wire a circuit and for a rig's saved runs: the same fields with the same words
 * in the same order (cableRunFields), and each variant's extras only where it needs them.
 */
export function CircuitForm(props: CalculatorProps | SavedProps) {
  const saved = props.variant === 'saved';
  const schema = saved ? cableRunSchema : circuitSchema;
  const form = useForm<Values>({ resolver: zodResolver(schema) as unknown as Resolver<Values>, defaultValues: props.initial as Values, mode: 'onTouched' });
  const [source, setSource] = useState<CircuitSource>(sourceOf(props.initial as Values));
  const sources: { value: CircuitSource; label: string }[] = [
    { value: 'current', label: 'A device (its current)' },
    ...(saved && props.loads.length ? [{ value: 'load' as const, label: "One of the rig's loads" }] : []),
    ...(!saved ? [{ value: 'inverter' as const, label: 'An inverter (its watts)' }] : props.hasInverter ? [{ value: 'inverter' as const, label: "The rig's inverter" }] : []),
  ];
  const choose = (next: CircuitSource) => {
    setSource(next);
    form.setValue('currentA', next === 'current' ? (form.getValues('currentA') ?? 10) : undefined);
    if (saved) {
      form.setValue('loadId', next === 'load' ? props.loads[0]?.value : undefined);
      form.setValue('inverterLink', next === 'inverter');
      form.setValue('purpose', next === 'inverter' ? 'inverter' : 'general');
    } else {
      form.setValue('end', next === 'inverter' ? 'inverter' : 'device');
    }
  };
  const submit = form.handleSubmit((values) => (props.variant === 'saved' ? props.onSubmit(values as CableRunInput) : props.onSubmit(values as CircuitInput)));
  const c = form.control;

  return (
    <Form control={c} onSubmit={submit} busy={props.busy}>
      <Card testID="circuit-form">
        {props.heading ? <Heading>{props.heading}</Heading> : null}
        {saved ? <TextField control={c} name="label" label="Name" hint="Which circuit, as you call it." maxLength={80} /> : null}
        {sources.length > 1 ? <ChipGroup label={L.end} options={sources} value={source} onChange={choose} testIDPrefix="circuit-end" /> : null}
        <TextField control={c} name="to" label={L.to} hint={L.toHint} maxLength={80} />
        {source === 'current' ? <NumberField control={c} name="currentA" label={L.current} unit="A" hint={L.currentHint} /> : null}
        {source === 'load' && saved ? (
          <ChoiceField control={c} name="loadId" label="Load" options={props.loads} hint="DC loads only: an AC load's own circuit is mains wiring, outside these tables." />
        ) : null}
        {source === 'inverter' && saved ? <Small>Sized from the inverter&apos;s rating at its 10.5 V cut-out and its efficiency, as a continuous load.</Small> : null}
        {source === 'inverter' && !saved ? (
          <>
            <NumberField control={c} name="inverterW" label={L.inverterW} unit="W" hint={L.inverterHint} />
            <NumberField control={c} name="efficiencyPercent" label={L.efficiency} unit="%" />
          </>
        ) : null}
        <ChoiceField control={c} name="route" label={L.route} options={ROUTE_OPTIONS} hint={L.routeHint} />
        <ChoiceField control={c} name="cableType" label={L.cableType} options={CABLE_TYPE_OPTIONS} />
        <NumberField control={c} name="lengthM" label={L.length} unit="m" hint={L.lengthHint} />
        <ChoiceField control={c} name="returnPath" label={L.return} options={RETURN_OPTIONS} />
        <NumberField control={c} name="maxDropPercent" label={L.allowedDrop} unit="%" hint={L.allowedDropHint} />
        {source === 'inverter' ? null : <SwitchField control={c} name="continuous" label={L.continuous} />}
        <ChoiceField
          control={c}
          name="existingAwg"
          label={L.existingAwg}
          options={[{ value: undefined as unknown as '10', label: 'None' }, ...FITTED_AWG.map((a) => ({ value: a, label: `${a} AWG` }))]}
        />
        {saved ? null : (
          <ChoiceField
            control={c}
            name="systemVoltage"
            label={L.systemVoltage}
            options={[
              { value: 12, label: '12 V' },
              { value: 24, label: '24 V' },
            ]}
          />
        )}
        {props.error ? (
          <Text role="alert" style={styles.error}>
            {props.error}
          </Text>
        ) : null}
        {props.variant === 'saved' ? (
          <SubmitButton testID="run-submit" label="Save" extra={<Button tone="secondary" label="Cancel" onPress={props.onCancel} />} />
        ) : (
          <SubmitButton testID="size-run" label="Wire it" />
        )}
      </Card>
    </Form>
  );
}

const styles = StyleSheet.create({
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
});
