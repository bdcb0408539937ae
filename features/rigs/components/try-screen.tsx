import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';

import { formatDays } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { energyInText, formatEnergy, useUnits } from '@/components/units';
import { useIsWide } from '@/components/use-layout';
import type { CompareSide } from '@/shared/energy/compare';
import type { Load } from '@/shared/schemas/projection';
import { colors, space, type } from '@/shared/theme';
import { useLoadCreateMutation, useRigQuery, useTryLoadsMutation } from '../api/rig';
import type { Device } from '@/shared/devices';
import { DevicePicker } from './device-picker';
import { EMPTY_LOAD, LoadForm } from './load-form';
import { fromDevice } from '../utils/load-units';

/** Try a load: the rig with and without a candidate, side by side, then adopt or discard it. */
export function TryScreen({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  const wide = useIsWide();
  const { units } = useUnits();
  const tryIt = useTryLoadsMutation(rigId);
  const adopt = useLoadCreateMutation(rigId);
  const [candidate, setCandidate] = useState<Load | null>(null);
  const [picked, setPicked] = useState<Device | null>(null);
  const horizon = rig.data?.power.horizonDays ?? 14;
  const V = rig.data?.power.systemVoltage ?? 12;
  const result = tryIt.data;
  return (
    <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]} testID="try-screen">
      <View style={[{ gap: space.lg }, wide && { flex: 2 }]}>
        <Card>
          <DevicePicker label="Start from a typical device" onPick={(d) => { setPicked(d); setCandidate(null); tryIt.reset(); }} disabled={(d) => (d.load.supply === 'ac' && rig.data && !rig.data.power.inverter ? 'Needs an inverter.' : null)} />
        </Card>
        <LoadForm
          key={candidate ? 'tried' : `fresh-${picked?.id ?? ''}`}
          title="A device you are thinking of"
          initial={candidate ?? (picked ? { ...fromDevice(picked, V), status: 'candidate' } : { ...EMPTY_LOAD, name: '', status: 'candidate' })}
          submitLabel="Try it"
          busy={tryIt.isPending}
          error={tryIt.error?.message}
          systemVoltage={V}
          onSubmit={(load) => {
            setCandidate(load);
            tryIt.mutate([{ ...load, status: 'candidate' }]);
          }}
        />
      </View>
      <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
        {result && candidate ? (
          <Card testID="try-result">
            <Heading>With {candidate.name}</Heading>
            {result.onDevice ? (
              <Small testID="try-on-device" style={{ color: colors.inkSoft }}>
                Worked out on this device (no connection), from the rig as last saved here. The server works it out again when you are back online.
              </Small>
            ) : null}
            <View style={styles.sides}>
              <Side title="Now" side={result.without} horizon={horizon} V={V} />
              <Side title={`With ${candidate.name}`} side={result.with} horizon={horizon} V={V} testID="with" />
            </View>
            <Body>
              Days parked {delta(result.delta.daysParked)}, days on your routine {delta(result.delta.daysOnRoutine)}; {result.delta.dailyAh >= 0 ? '+' : ''}
              {formatEnergy(result.delta.dailyAh, units, V)} a day.
            </Body>
            {result.warnings.map((w) => (
              <Small key={w.code} style={{ color: colors.short }}>
                ▲ {energyInText(w.message, units, V)}
              </Small>
            ))}
            {rig.data?.permissions.manageLoads ? (
              <View style={{ flexDirection: 'row', gap: space.md, flexWrap: 'wrap' }}>
                <Button
                  testID="adopt"
                  label="Adopt it as installed"
                  busy={adopt.isPending}
                  onPress={() =>
                    adopt.mutate({ ...candidate, status: 'installed' }, { onSuccess: () => { setCandidate(null); tryIt.reset(); } })
                  }
                />
                <Button tone="danger" label="Discard" testID="discard" onPress={() => { setCandidate(null); tryIt.reset(); }} />
              </View>
            ) : null}
            {adopt.isError ? <Text role="alert" style={{ ...type.body, color: colors.short }}>{adopt.error.message}</Text> : null}
          </Card>
        ) : (
          <Card>
            <Small>Enter a device and press “Try it” to see what it does to your days parked. Nothing is saved until you adopt it.</Small>
            {adopt.isSuccess ? <Text style={{ ...type.body, color: colors.comfortable }}>Adopted: it is now in Loads and in the Outlook.</Text> : null}
          </Card>
        )}
      </View>
    </View>
  );
}

function delta(d: number | null) {
  if (d === null) return 'unchanged (beyond the horizon)';
  return `${d >= 0 ? '+' : ''}${d.toFixed(1)}`;
}

function Side({ title, side, horizon, V, testID }: { title: string; side: CompareSide; horizon: number; V: number; testID?: string }) {
  const { units } = useUnits();
  return (
    <View style={styles.side} testID={testID}>
      <Text style={styles.sideTitle}>{title}</Text>
      <Text style={styles.big} testID={testID ? `${testID}-days-parked` : undefined}>
        {formatDays(side.daysParked, horizon)}
      </Text>
      <Small>parked</Small>
      <Text style={styles.mid}>{formatDays(side.daysOnRoutine, horizon)}</Text>
      <Small>on your routine</Small>
      <Small>{formatEnergy(side.dailyAh, units, V)} a day</Small>
      <MarginBadge state={side.marginState} />
    </View>
  );
}

const styles = StyleSheet.create({
  sides: { flexDirection: 'row', gap: space.lg, flexWrap: 'wrap' },
  side: { flex: 1, minWidth: 140, gap: 2, padding: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: 12 },
  sideTitle: { ...type.heading, fontSize: 15, color: colors.ink },
  big: { ...type.title, fontSize: 26, color: colors.night },
  mid: { ...type.heading, color: colors.night },
});
