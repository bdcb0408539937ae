import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';

import { formatDays, formatWhen } from '@/components/format';
import { energyInText, useUnits } from '@/components/units';
import { useIsNarrow } from '@/components/use-layout';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { colors, space, type } from '@/shared/theme';
import { useHistoryQuery } from '../api/history';
import { useFixUndoMutation } from '../api/fixes';
import { useOutlookQuery, useRigQuery } from '../api/rig';

/** History: who changed what on the rig and when, with the Days parked before and after each change. */
export function HistoryScreen({ rigId }: { rigId: string }) {
  const history = useHistoryQuery(rigId);
  const outlook = useOutlookQuery(rigId);
  const rig = useRigQuery(rigId);
  const undo = useFixUndoMutation(rigId);
  const { units } = useUnits();
  // On a phone the figures wrap under the summary: aligned with it on the left, not floated right.
  const narrow = useIsNarrow();
  const horizon = outlook.data?.horizonDays ?? 14;
  if (history.isPending) return <ActivityIndicator color={colors.night} />;
  if (history.isError) return <Body style={{ color: colors.short }}>{history.error.message}</Body>;
  return (
    <Card testID="history">
      <Heading>History</Heading>
      {undo.isError ? <Text role="alert" style={{ ...type.body, color: colors.short }}>{undo.error.message}</Text> : null}
      {history.data.length ? null : <Small>No changes yet. The rig&apos;s creation, edits to loads, cable runs, the battery, the inverter, charging and the routine, and people joining or leaving, show here.</Small>}
      {history.data.map((h) => {
        const created = h.kind === 'rig-created';
        const moved = !created && h.daysParkedBefore !== h.daysParkedAfter;
        return (
          <View key={h.id} style={styles.row} testID={`history-${h.kind}`}>
            <View style={{ flex: 1, minWidth: 200, gap: 2 }}>
              <Text style={styles.summary}>
                {h.actor.name} {energyInText(h.summary, units, rig.data?.power.systemVoltage)}
              </Text>
              <Small>{formatWhen(h.at)}</Small>
              {h.undoable && rig.data?.permissions.edit ? (
                <Button testID="history-undo" label="Undo this Fix" busy={undo.isPending && undo.variables === h.id} onPress={() => undo.mutate(h.id)} />
              ) : null}
            </View>
            <View style={[styles.days, narrow && { alignItems: 'flex-start' }]}>
              <Small>Days parked</Small>
              <Text style={[styles.figure, moved && (h.daysParkedAfter ?? Infinity) < (h.daysParkedBefore ?? Infinity) ? { color: colors.short } : null]}>
                {moved ? `${formatDays(h.daysParkedBefore, horizon)} → ${formatDays(h.daysParkedAfter, horizon)}` : `${formatDays(h.daysParkedAfter, horizon)}${created ? '' : ' (no change)'}`}
              </Text>
            </View>
          </View>
        );
      })}
    </Card>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  summary: { ...type.body, color: colors.ink },
  days: { alignItems: 'flex-end', minWidth: 150 },
  figure: { ...type.heading, color: colors.ink },
});
