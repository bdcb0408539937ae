import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { useUnits } from '@/components/units';
import { useIsWide } from '@/components/use-layout';
import { CABLE_CAUTIONS } from '@/shared/safety';
import type { CableRunForm, CableRunInput } from '@/shared/schemas/cable-run';
import { colors, space, type } from '@/shared/theme';
import { type SavedCableRun, useCableRunCreateMutation, useCableRunDeleteMutation, useCableRunsQuery, useCableRunUpdateMutation } from '../api/cable-runs';
import { CircuitForm } from './circuit-form';
import { CircuitCautions, CircuitResult } from './circuit-result';

const EMPTY: CableRunForm = { label: '', from: 'Battery', to: '', lengthM: 2, currentA: 10, maxDropPercent: 3, route: 'cabin', cableType: 'xlpe', returnPath: 'cable', continuous: false, purpose: 'general' };

export type SavedRunsScreenProps = {
  rigId: string;
  /** The viewer may add, edit and delete runs. */
  canEdit: boolean;
  /** The rig's installed DC loads, to take a run's current from. */
  loads: { value: string; label: string }[];
  hasInverter: boolean;
};

/** A rig's saved cable runs: each circuit from the battery, answered and drawn as Wire a circuit answers it, with the same form to add or edit one. */
export function SavedRunsScreen({ rigId, canEdit, loads, hasInverter }: SavedRunsScreenProps) {
  const runs = useCableRunsQuery(rigId);
  const { units } = useUnits();
  const wide = useIsWide();
  const [editing, setEditing] = useState<SavedCableRun | 'new' | null>(null);
  const create = useCableRunCreateMutation(rigId);
  const update = useCableRunUpdateMutation(rigId);
  const remove = useCableRunDeleteMutation(rigId);
  if (runs.isPending) return <ActivityIndicator color={colors.night} />;
  if (runs.isError) return <Body style={{ color: colors.short }}>{runs.error.message}</Body>;
  const size = (r: SavedCableRun) => (r.sizing ? (units.wire === 'mm2' ? `${r.sizing.metric.mm2} mm²` : `${r.sizing.awg} AWG`) : '—');
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
              <View style={styles.runHead}>
                <View style={{ flex: 1, minWidth: 200, gap: 2 }}>
                  <Text style={styles.name}>{r.label}</Text>
                  <Small>
                    {r.from} → {r.to || '—'} · {r.lengthM} m one way · {r.currentA} A{r.loadName ? ` (${r.loadName})` : ''}
                    {r.currentFrom === 'inverter' ? ' (the inverter at its 10.5 V cut-out, continuous)' : ''}
                  </Small>
                  <Text style={styles.figures} testID={`run-size-${r.label}`}>
                    {size(r)} · drop {drop(r)} · {r.sizing ? `${units.wire === 'mm2' ? r.sizing.metric.fuseA : r.sizing.fuseA} A fuse or breaker` : 'no size'}
                  </Text>
                </View>
                {canEdit ? (
                  <View style={{ flexDirection: 'row', gap: space.xs }}>
                    <Pressable role="button" aria-label={`Edit ${r.label}`} testID={`edit-run-${r.label}`} onPress={() => setEditing(r)} style={styles.chip}>
                      <Text style={styles.chipText}>Edit</Text>
                    </Pressable>
                    <Pressable role="button" aria-label={`Delete ${r.label}`} onPress={() => remove.mutate(r.id)} style={styles.chip}>
                      <Text style={styles.chipText}>Delete</Text>
                    </Pressable>
                  </View>
                ) : null}
              </View>
              {r.sizing ? (
                <CircuitResult
                  testID={`run-${r.label}`}
                  result={r.sizing}
                  device={r.to || r.loadName || 'Device'}
                  lengthM={r.lengthM}
                  allowedDropPercent={r.maxDropPercent}
                  returnPath={r.returnPath}
                  warnings={r.warnings}
                />
              ) : (
                <>
                  {r.warnings.map((w) => (
                    <Text key={w} role="alert" style={styles.warning}>
                      ▲ {w}
                    </Text>
                  ))}
                  <CircuitCautions cautions={CABLE_CAUTIONS} />
                </>
              )}
            </View>
          ))}
        </Card>
      </View>
      {editing ? (
        <View style={wide ? { flex: 2 } : undefined}>
          <CircuitForm
            key={editing === 'new' ? 'new' : editing.id}
            variant="saved"
            heading={editing === 'new' ? 'Add a cable run' : `Edit ${editing.label}`}
            initial={editing === 'new' ? EMPTY : toForm(editing)}
            loads={loads}
            hasInverter={hasInverter}
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
    route: r.route,
    cableType: r.cableType,
    returnPath: r.returnPath,
    continuous: r.continuous,
    purpose: r.purpose,
    ...(r.existingAwg ? { existingAwg: r.existingAwg as '10' } : {}),
    ...(r.existingMm2 ? { existingMm2: r.existingMm2 as 10 } : {}),
  };
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  run: { gap: space.sm, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  runHead: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'flex-start' },
  name: { ...type.heading, fontSize: 15, color: colors.ink },
  figures: { ...type.body, color: colors.night, fontFamily: 'Nunito_700Bold' },
  warning: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
});
