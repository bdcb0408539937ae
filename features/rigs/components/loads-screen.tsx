import { useMemo, useState } from 'react';
import { ActivityIndicator, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';

import { ChipGroup } from '@/components/chips';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { formatEnergy, formatPower, useUnits } from '@/components/units';
import { useIsNarrow, useIsWide } from '@/components/use-layout';
import { loadRunningCurrentA } from '@/shared/energy/profile';
import type { Load } from '@/shared/schemas/projection';
import { colors, space, type } from '@/shared/theme';
import { type SavedLoad, useLoadCreateMutation, useLoadDeleteMutation, useLoadUpdateMutation, useOutlookQuery, useRigQuery } from '../api/rig';
import type { Device } from '@/shared/devices';
import { DevicePicker } from './device-picker';
import { asWatts, fromDevice } from '../utils/load-units';
import { EMPTY_LOAD, LoadForm } from './load-form';

type SortKey = 'name' | 'member' | 'supply' | 'watts' | 'hours' | 'duty' | 'ah' | 'share';
const COLUMNS: { key: SortKey; label: string; width: number }[] = [
  { key: 'name', label: 'Load', width: 170 },
  { key: 'member', label: 'Added by', width: 110 },
  { key: 'supply', label: 'Supply', width: 60 },
  { key: 'watts', label: 'Draw', width: 70 },
  { key: 'hours', label: 'h/day', width: 60 },
  { key: 'duty', label: 'Duty', width: 60 },
  { key: 'ah', label: 'Per day', width: 70 },
  { key: 'share', label: 'Share', width: 60 },
];

/** Loads: the rig's devices, sortable, filterable by member; add, edit and delete. */
export function LoadsScreen({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  const outlook = useOutlookQuery(rigId);
  const wide = useIsWide();
  const narrow = useIsNarrow();
  const { units } = useUnits();
  const [sort, setSort] = useState<{ key: SortKey; desc: boolean }>({ key: 'ah', desc: true });
  const [member, setMember] = useState<string | null>(null);
  const [editing, setEditing] = useState<SavedLoad | 'new' | null>(null);
  const [confirming, setConfirming] = useState<string | null>(null);
  const [picked, setPicked] = useState<Device | null>(null);
  const create = useLoadCreateMutation(rigId);
  const update = useLoadUpdateMutation(rigId);
  const remove = useLoadDeleteMutation(rigId);

  const rows = useMemo(() => {
    if (!rig.data) return [];
    const V = rig.data.power.systemVoltage;
    const eff = (rig.data.power.inverter?.efficiencyPercent ?? 90) / 100;
    const byName = new Map((outlook.data?.breakdown ?? []).map((b) => [b.name, b]));
    const list = rig.data.loads
      .filter((l) => l.status === 'installed')
      .filter((l) => !member || l.addedBy?.id === member)
      .map((l) => {
        const b = byName.get(l.name);
        return { load: l, amps: loadRunningCurrentA(l, V, eff), ah: b?.ahPerDay ?? 0, share: b?.share ?? 0 };
      });
    const val = (r: (typeof list)[number]): string | number =>
      ({ name: r.load.name.toLowerCase(), member: r.load.addedBy?.name ?? '', supply: r.load.supply, watts: r.load.watts ?? r.amps * V, hours: r.load.hoursPerDay, duty: r.load.dutyPercent, ah: r.ah, share: r.share })[sort.key];
    return list.sort((a, b) => (val(a) < val(b) ? -1 : val(a) > val(b) ? 1 : 0) * (sort.desc ? -1 : 1));
  }, [rig.data, outlook.data, sort, member]);

  if (rig.isPending) return <ActivityIndicator color={colors.night} />;
  if (rig.isError) return <Body style={{ color: colors.short }}>{rig.error.message}</Body>;
  const V = rig.data.power.systemVoltage;
  const canEdit = rig.data.permissions.manageLoads;
  // A member changes the loads they added; an owner any load (the server refuses the rest with 403).
  const mayChange = (load: SavedLoad) => rig.data.permissions.editAnyLoad || (canEdit && load.addedBy?.id === rig.data.viewerId);
  const members = [...new Map(rig.data.loads.filter((l) => l.addedBy).map((l) => [l.addedBy!.id, l.addedBy!.name])).entries()];
  const maxWatts = rig.data.power.systemVoltage * 400;
  const save = (load: Load) => {
    if (editing === 'new') create.mutate(load, { onSuccess: () => { setEditing(null); setPicked(null); } });
    else if (editing) update.mutate({ id: editing.id, load }, { onSuccess: () => setEditing(null) });
  };
  const formError = (editing === 'new' ? create.error : update.error)?.message ?? null;

  return (
    <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]} testID="loads-screen">
      <Card style={wide ? { flex: 3 } : undefined}>
        <View style={styles.head}>
          <Heading>Loads</Heading>
          {canEdit && !editing ? <Button testID="add-load" label="Add a load" onPress={() => setEditing('new')} /> : null}
        </View>
        <ChipGroup
          label="Show loads added by"
          showLabel={false}
          options={[{ value: null, label: 'Everyone', testID: 'filter-Everyone' }, ...members.map(([id, name]) => ({ value: id as string | null, label: name, testID: `filter-${name}` }))]}
          value={member}
          onChange={setMember}
          testIDPrefix="filter"
        />
        {narrow ? (
          <View style={{ gap: space.sm }} testID="load-cards">
            {rows.map(({ load, amps, ah, share }) => (
              <View key={load.id} style={styles.card} testID={`load-${load.name}`}>
                <Text style={styles.cardTitle}>{load.quantity > 1 ? `${load.name} ×${load.quantity}` : load.name}</Text>
                <Text style={styles.cardLine}>
                  {load.supply.toUpperCase()} · {formatPower((load.watts ?? amps * V) * load.quantity, amps, units)} · {load.hoursPerDay} h a day{load.dutyPercent < 100 ? ` at ${load.dutyPercent} %` : ''}
                </Text>
                <Text style={styles.cardLine}>
                  {formatEnergy(ah, units, V)} a day · {Math.round(share * 100)} % of the use · added by {load.addedBy?.name.split(' ')[0] ?? 'someone who left'}
                </Text>
                {mayChange(load) ? <LoadActions load={load} confirming={confirming === load.id} onEdit={() => setEditing(load)} onAsk={() => setConfirming(load.id)} onKeep={() => setConfirming(null)} onDelete={() => remove.mutate(load.id, { onSuccess: () => setConfirming(null) })} /> : null}
              </View>
            ))}
          </View>
        ) : (
        <ScrollView horizontal>
          <View role="table">
            <View style={styles.tr} role="row">
              {COLUMNS.map((c) => (
                <Pressable
                  key={c.key}
                  role="columnheader"
                  aria-sort={sort.key === c.key ? (sort.desc ? 'descending' : 'ascending') : 'none'}
                  onPress={() => setSort((s) => ({ key: c.key, desc: s.key === c.key ? !s.desc : c.key !== 'name' }))}
                  style={{ width: c.width, minHeight: 44, justifyContent: 'center' }}
                  testID={`sort-${c.key}`}
                >
                  <Text style={styles.th}>
                    {c.label}
                    {sort.key === c.key ? (sort.desc ? ' ↓' : ' ↑') : ''}
                  </Text>
                </Pressable>
              ))}
              {canEdit ? (
                <View role="columnheader" style={{ width: 200, justifyContent: 'center' }}>
                  <Text style={styles.th}>Change</Text>
                </View>
              ) : null}
            </View>
            {rows.map(({ load, amps, ah, share }) => (
              <View key={load.id} style={styles.tr} role="row" testID={`load-${load.name}`}>
                <Text role="cell" style={[styles.td, { width: 170 }]}>{load.quantity > 1 ? `${load.name} ×${load.quantity}` : load.name}</Text>
                <Text role="cell" style={[styles.td, { width: 110 }]}>{load.addedBy?.name.split(' ')[0] ?? '—'}</Text>
                <Text role="cell" style={[styles.td, { width: 60 }]}>{load.supply.toUpperCase()}</Text>
                <Text role="cell" style={[styles.td, { width: 70 }]}>{formatPower((load.watts ?? amps * V) * load.quantity, amps, units)}</Text>
                <Text role="cell" style={[styles.td, { width: 60 }]}>{load.hoursPerDay}</Text>
                <Text role="cell" style={[styles.td, { width: 60 }]}>{load.dutyPercent} %</Text>
                <Text role="cell" style={[styles.td, { width: 70 }]}>{formatEnergy(ah, units, V)}</Text>
                <Text role="cell" style={[styles.td, { width: 60 }]}>{Math.round(share * 100)} %</Text>
                {canEdit ? (
                  <View role="cell" style={{ width: 200 }}>
                    {mayChange(load) ? <LoadActions load={load} confirming={confirming === load.id} onEdit={() => setEditing(load)} onAsk={() => setConfirming(load.id)} onKeep={() => setConfirming(null)} onDelete={() => remove.mutate(load.id, { onSuccess: () => setConfirming(null) })} /> : null}
                  </View>
                ) : null}
              </View>
            ))}
          </View>
        </ScrollView>
        )}
        {remove.isError ? <Text role="alert" style={{ ...type.body, color: colors.short }}>{remove.error.message}</Text> : null}
        {rows.length === 0 ? <Small>No loads{member ? ' added by this member' : ''} yet.</Small> : null}
        {outlook.data ? (
          <Small>
            Standby a day: inverter idle {formatEnergy(outlook.data.standby.inverterIdleAh, units, V)}, key-off draw {formatEnergy(outlook.data.standby.keyOffAh, units, V)}, self-discharge {formatEnergy(outlook.data.standby.selfDischargeAh, units, V)}.
          </Small>
        ) : null}
      </Card>
      {editing ? (
        <View style={[{ gap: space.lg }, wide && { flex: 2 }]}>
          {editing === 'new' ? (
            <Card>
              <DevicePicker onPick={setPicked} disabled={(d) => (d.load.supply === 'ac' && !rig.data.power.inverter ? 'Needs an inverter.' : null)} />
            </Card>
          ) : null}
          <LoadForm
            key={editing === 'new' ? `new-${picked?.id ?? ''}` : editing.id}
            title={editing === 'new' ? (picked ? `Add ${picked.name}` : 'Add a load') : `Edit ${editing.name}`}
            initial={editing === 'new' ? (picked ? fromDevice(picked, V) : EMPTY_LOAD) : asWatts(stripSaved(editing), rig.data.power.systemVoltage)}
            submitLabel={editing === 'new' ? 'Add' : 'Save'}
            busy={create.isPending || update.isPending}
            error={formError}
            onSubmit={save}
            onCancel={() => {
              setEditing(null);
              setPicked(null);
            }}
            maxWatts={maxWatts}
            systemVoltage={V}
          />
        </View>
      ) : null}
    </View>
  );
}

function LoadActions({ load, confirming, onEdit, onAsk, onKeep, onDelete }: { load: SavedLoad; confirming: boolean; onEdit: () => void; onAsk: () => void; onKeep: () => void; onDelete: () => void }) {
  return (
    <View style={styles.actions}>
      {confirming ? (
        <>
          <Button tone="danger" label="Delete" accessibilityLabel={`Yes, delete ${load.name}`} onPress={onDelete} testID={`confirm-delete-${load.name}`} />
          <Button tone="secondary" label="Keep" accessibilityLabel={`Keep ${load.name}`} onPress={onKeep} />
        </>
      ) : (
        <>
          <Button tone="secondary" label="Edit" accessibilityLabel={`Edit ${load.name}`} onPress={onEdit} testID={`edit-${load.name}`} />
          <Button tone="danger" label="Delete" accessibilityLabel={`Delete ${load.name}`} onPress={onAsk} testID={`delete-${load.name}`} />
        </>
      )}
    </View>
  );
}

function stripSaved({ id: _id, addedBy: _a, ...load }: SavedLoad): Load {
  return load;
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  tr: { flexDirection: 'row', alignItems: 'center', borderBottomWidth: 1, borderBottomColor: colors.line, paddingVertical: space.sm },
  th: { ...type.small, fontFamily: 'Nunito_700Bold', color: colors.ink },
  td: { ...type.small, color: colors.ink, paddingRight: space.sm },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  card: { gap: 2, paddingVertical: space.md, borderBottomWidth: 1, borderBottomColor: colors.line },
  cardTitle: { ...type.heading, fontSize: 15, color: colors.ink },
  cardLine: { ...type.small, color: colors.ink },
});
