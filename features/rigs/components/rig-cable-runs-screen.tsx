import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { ChoiceField, Form, NumberField, SubmitButton, SwitchField } from '@/components/form';
import { TextField } from '@/components/text-field';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { useUnits } from '@/components/units';
import { useIsWide } from '@/components/use-layout';
import { CircuitDrawing } from '@/components/wiring/circuit-drawing';
import { type CableRunForm, type CableRunInput, cableRunSchema } from '@/shared/schemas/cable-run';
import { CIRCUIT_LABELS as L, INSULATION_OPTIONS, RETURN_OPTIONS } from '@/shared/schemas/circuit';
import { colors, radius, space, type } from '@/shared/theme';
import { type SavedCableRun, useCableRunCreateMutation, useCableRunDeleteMutation, useCableRunsQuery, useCableRunUpdateMutation } from '../api/cable-runs';
import { useRigQuery } from '../api/rig';
import { type RunSource, RunSourceChips } from './run-source';

const EMPTY: CableRunForm = { label: '', from: 'Battery', to: '', lengthM: 2, currentA: 10, maxDropPercent: 3, insulationC: 105, engineSpace: false, returnPath: 'cable', continuous: false, purpose: 'general' };
const CAUTION =
  'Fit each fuse or breaker as close to the battery as possible (within 7 in / 178 mm of the source), use proper terminals and strain relief, disconnect the battery before work, and follow local codes and a qualified auto electrician. Figures are estimates, not a guarantee.';

/** Cable runs: each circuit from the battery with its size, drop and protection. */
export function RigCableRunsScreen({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  const runs = useCableRunsQuery(rigId);
  const { units } = useUnits();
  const wide = useIsWide();
  const [editing, setEditing] = useState<SavedCableRun | 'new' | null>(null);
  const create = useCableRunCreateMutation(rigId);
  const update = useCableRunUpdateMutation(rigId);
  const remove = useCableRunDeleteMutation(rigId);
  if (rig.isPending || runs.isPending) return <ActivityIndicator color={colors.night} />;
  if (rig.isError || runs.isError) return <Body style={{ color: colors.short }}>{(rig.error ?? runs.error)?.message}</Body>;
  const canEdit = rig.data.permissions.manageLoads;
  const size = (r: SavedCableRun) => (r.sizing ? (units.wire === 'mm2' ? `${r.sizing.mm2} mm²` : `${r.sizing.awg} AWG`) : '—');
  const drop = (r: SavedCableRun) => (r.sizing ? (units.wire === 'mm2' ? r.sizing.metric.dropPercent : r.sizing.dropPercent).toFixed(1) + ' %' : '—');
  const save = (run: CableRunInput) => {
    if (editing === 'new') create.mutate(run, { onSuccess: () => setEditing(null) });
    else if (editing) update.mutate({ id: editing.id, run }, { onSuccess: () => setEditing(null) });
  };
  return (
    <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]} testID="rig-cable-runs-screen">
      <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
        <Card>
          <View style={styles.head}>
            <Heading>Cable runs</Heading>
            {canEdit && !editing ? <Button testID="add-run" label="Add a run" onPress={() => setEditing('new')} /> : null}
          </View>
          {runs.data.length === 0 ? <Small>No cable runs yet.</Small> : null}
          {runs.data.map((r) => (
            <View key={r.id} style={styles.run} testID={`run-${r.label}`}>
              <View style={{ flex: 1, minWidth: 200, gap: 2 }}>
                <Text style={styles.name}>{r.label}</Text>
                <Small>
                  {r.from} → {r.to || '—'} · {r.lengthM} m one way · {r.currentA} A{r.loadName ? ` (${r.loadName})` : ''}
                  {r.currentFrom === 'inverter' ? ' (the inverter at its 10.5 V cut-out, continuous)' : ''}
                </Small>
                <Text style={styles.figures} testID={`run-size-${r.label}`}>
                  {size(r)} · drop {drop(r)} · {r.sizing ? `${r.sizing.fuseA} A fuse or breaker` : 'no size'}
                </Text>
                {r.sizing ? (
                  <CircuitDrawing
                    testID={`run-drawing-${r.label}`}
                    size={size(r)}
                    lengthM={r.lengthM}
                    dropPercent={units.wire === 'mm2' ? r.sizing.metric.dropPercent : r.sizing.dropPercent}
                    allowedDropPercent={r.maxDropPercent}
                    fuseA={r.sizing.fuseA}
                    device={r.loadName ?? (r.to || 'Device')}
                    returnPath={r.returnPath}
                  />
                ) : null}
                {r.warnings.map((w) => (
                  <Text key={w} role="alert" style={styles.warning}>
                    ▲ {w}
                  </Text>
                ))}
              </View>
              {canEdit ? (
                <View style={{ flexDirection: 'row', gap: space.xs }}>
                  <Pressable role="button" aria-label={`Edit ${r.label}`} onPress={() => setEditing(r)} style={styles.chip}>
                    <Text style={styles.chipText}>Edit</Text>
                  </Pressable>
                  <Pressable role="button" aria-label={`Delete ${r.label}`} onPress={() => remove.mutate(r.id)} style={styles.chip}>
                    <Text style={styles.chipText}>Delete</Text>
                  </Pressable>
                </View>
              ) : null}
            </View>
          ))}
        </Card>
        <View style={styles.caution} role="note" testID="run-cautions">
          <Small style={{ color: colors.ink }}>{CAUTION}</Small>
        </View>
      </View>
      {editing ? (
        <View style={wide ? { flex: 2 } : undefined}>
          <RunForm
            key={editing === 'new' ? 'new' : editing.id}
            initial={editing === 'new' ? EMPTY : toForm(editing)}
            loads={rig.data.loads.filter((l) => l.status === 'installed' && l.supply === 'dc').map((l) => ({ value: l.id, label: l.name }))}
            hasInverter={rig.data.power.inverter !== null}
            busy={create.isPending || update.isPending}
            error={(editing === 'new' ? create.error : update.error)?.message}
            onSubmit={save}
            onCancel={() => setEditing(null)}
          />
        </View>
      ) : null}
    </View>
  );
}

function toForm(r: SavedCableRun): CableRunForm {
  return {
    label: r.label,
    from: r.from,
    to: r.to,
    lengthM: r.lengthM,
    ...(r.currentFrom === 'load' && r.loadId ? { loadId: r.loadId } : r.currentFrom === 'inverter' ? { inverterLink: true } : { currentA: r.currentA }),
    maxDropPercent: r.maxDropPercent,
    insulationC: r.insulationC as 105,
    engineSpace: r.engineSpace,
    returnPath: r.returnPath,
    continuous: r.continuous,
    purpose: r.purpose,
    ...(r.existingAwg ? { existingAwg: r.existingAwg as '10' } : {}),
  };
}

function RunForm(props: {
  initial: CableRunForm;
  loads: { value: string; label: string }[];
  hasInverter: boolean;
  busy: boolean;
  error?: string;
  onSubmit: (r: CableRunInput) => void;
  onCancel: () => void;
}) {
  const form = useForm<CableRunForm, unknown, CableRunInput>({ resolver: zodResolver(cableRunSchema), defaultValues: props.initial, mode: 'onTouched' });
  const [source, setSource] = useState<RunSource>(props.initial.loadId !== undefined ? 'load' : props.initial.inverterLink ? 'inverter' : 'current');
  const chooseSource = (next: RunSource) => {
    setSource(next);
    form.setValue('currentA', next === 'current' ? 10 : undefined);
    form.setValue('loadId', next === 'load' ? props.loads[0]?.value : undefined);
    form.setValue('inverterLink', next === 'inverter');
    if (next === 'inverter') form.setValue('purpose', 'inverter');
  };
  return (
    <Form control={form.control} onSubmit={form.handleSubmit(props.onSubmit)} busy={props.busy}>
    <Card testID="run-form">
      <Heading>{props.initial.label ? `Edit ${props.initial.label}` : 'Add a cable run'}</Heading>
      <TextField control={form.control} name="label" label="Name" hint="Which circuit, as you call it." maxLength={80} />
      <TextField control={form.control} name="to" label="To" hint="The device at the end of the wire." maxLength={80} />
      <RunSourceChips value={source} onChange={chooseSource} hasLoads={props.loads.length > 0} hasInverter={props.hasInverter} />
      {source === 'load' ? <ChoiceField control={form.control} name="loadId" label="Load" options={props.loads} hint="DC loads only: an AC load's own circuit is mains wiring, outside these tables." /> : null}
      {source === 'current' ? <NumberField control={form.control} name="currentA" label={L.current} unit="A" /> : null}
      {source === 'inverter' ? <Small>Sized from the inverter&apos;s rating at its 10.5 V cut-out and its efficiency, as a continuous load.</Small> : null}
      <NumberField control={form.control} name="lengthM" label={L.length} unit="m" hint={L.lengthHint} />
      <SwitchField control={form.control} name="engineSpace" label={L.engineBay} hint={L.routeHint} />
      <ChoiceField control={form.control} name="insulationC" label={L.cableType} options={INSULATION_OPTIONS as { value: 105; label: string }[]} />
      <ChoiceField control={form.control} name="returnPath" label={L.return} options={RETURN_OPTIONS} />
      <NumberField control={form.control} name="maxDropPercent" label="Allowed drop" unit="%" hint="3 % for electronics and feeds, 10 % for other loads (ABYC E-11)." />
      <SwitchField control={form.control} name="continuous" label={L.continuous} />
      <ChoiceField
        control={form.control}
        name="existingAwg"
        label="Wire already fitted (to check it)"
        options={[{ value: undefined as unknown as '10', label: 'None' }, ...(['16', '14', '12', '10', '8', '6', '4', '2'] as const).map((a) => ({ value: a, label: `${a} AWG` }))]}
      />
      {props.error ? <Text role="alert" style={styles.warning}>{props.error}</Text> : null}
      <SubmitButton testID="run-submit" label="Save" extra={<Button tone="secondary" label="Cancel" onPress={props.onCancel} />} />
    </Card>
    </Form>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  run: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, alignItems: 'flex-start' },
  name: { ...type.heading, fontSize: 15, color: colors.ink },
  figures: { ...type.body, color: colors.night, fontFamily: 'Nunito_700Bold' },
  warning: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
  caution: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.lg, padding: space.lg },
});
