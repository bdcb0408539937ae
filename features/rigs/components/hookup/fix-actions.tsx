import { StyleSheet, Text, View } from 'react-native';

import { formatDays } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { Button, Card, Heading, Small } from '@/components/ui';
import type { FixKind } from '@/shared/energy/project';
import { colors, space, type } from '@/shared/theme';
import { type FixSide, useFixApplyMutation, useFixPreviewMutation } from '../../api/fixes';
import { useRigQuery } from '../../api/rig';

/** A Fix's Preview (the figures before and after, nothing saved) and Apply (the owner; undone from History). */
export function FixActions({ rigId, kind }: { rigId: string; kind: FixKind }) {
  const rig = useRigQuery(rigId);
  const preview = useFixPreviewMutation(rigId);
  const apply = useFixApplyMutation(rigId);
  const horizon = rig.data?.power.horizonDays ?? 14;
  const shown = preview.data?.kind === kind ? preview.data : null;
  return (
    <Card testID="fix-actions">
      <Heading>Try this Fix on the figures</Heading>
      <View style={styles.buttons}>
        <Button testID="fix-preview" label="Preview" busy={preview.isPending} onPress={() => preview.mutate(kind)} />
        {rig.data?.permissions.edit ? (
          <Button
            testID="fix-apply"
            label="Apply"
            busy={apply.isPending}
            disabled={!rig.data}
            onPress={() => rig.data && apply.mutate({ kind, version: rig.data.version }, { onSuccess: () => preview.reset() })}
          />
        ) : null}
      </View>
      {rig.data && !rig.data.permissions.edit ? <Small>Only the rig’s owner can apply a Fix.</Small> : null}
      {shown ? (
        <View style={styles.sides} testID="fix-preview-result">
          <Side title="Now" side={shown.before} horizon={horizon} />
          <Side title="With the Fix" side={shown.after} horizon={horizon} testID="fix-after" />
        </View>
      ) : null}
      {shown?.warnings.map((w) => (
        <Small key={w.code} style={{ color: colors.short }}>
          ▲ {w.message}
        </Small>
      ))}
      {preview.isError ? <Text role="alert" style={styles.error}>{preview.error.message}</Text> : null}
      {apply.isError ? <Text role="alert" style={styles.error}>{apply.error.message}</Text> : null}
      {apply.isSuccess ? (
        <Text style={{ ...type.body, color: colors.comfortable }} testID="fix-applied">
          Applied: the Power screen, the Outlook and this drawing now show it. Undo it from History.
        </Text>
      ) : null}
    </Card>
  );
}

function Side({ title, side, horizon, testID }: { title: string; side: FixSide; horizon: number; testID?: string }) {
  return (
    <View style={styles.side} testID={testID}>
      <Text style={styles.sideTitle}>{title}</Text>
      <Text style={styles.big}>{formatDays(side.daysParked, horizon)}</Text>
      <Small>parked</Small>
      <Text style={styles.mid}>{side.routineHolds ? 'Holds' : formatDays(side.daysOnRoutine, horizon)}</Text>
      <Small>on your routine</Small>
      <MarginBadge state={side.marginState} />
    </View>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
  sides: { flexDirection: 'row', gap: space.lg, flexWrap: 'wrap' },
  side: { flex: 1, minWidth: 130, gap: 2, padding: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: 12 },
  sideTitle: { ...type.heading, fontSize: 15, color: colors.ink },
  big: { ...type.title, fontSize: 26, color: colors.night },
  mid: { ...type.heading, color: colors.night },
  error: { ...type.body, color: colors.short },
});
