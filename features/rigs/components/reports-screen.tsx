import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { Body, Card, Heading, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { colors, radius, space, TAP_MIN, type } from '@/shared/theme';
import { type SentEmail, useSentEmailsQuery } from '../api/emails';
import { EmailFrame, ReportPreviewFrame } from './email-frame';

const KIND: Record<SentEmail['kind'], string> = { report: 'Weekly report', warning: 'Low-margin warning', notes: 'Notes' };

/** Reports: the weekly reports and warnings sent about this rig, each viewable as it was sent. */
export function ReportsScreen({ rigId }: { rigId: string }) {
  const emails = useSentEmailsQuery(rigId);
  const wide = useIsWide();
  const [openId, setOpenId] = useState<string | null>(null);
  const [previewing, setPreviewing] = useState<boolean | null>(null);
  if (emails.isPending) return <ActivityIndicator color={colors.night} />;
  if (emails.isError) return <Body style={{ color: colors.short }}>{emails.error.message}</Body>;
  const list = emails.data.filter((e) => e.kind !== 'notes');
  const open = list.find((e) => e.id === openId) ?? null;
  // Before the first report goes out the preview is open; afterwards it is one press away.
  const preview = !open && (previewing ?? list.length === 0);
  return (
    <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]} testID="reports">
      <Card style={wide ? { flex: 2 } : undefined}>
        <Heading>Reports</Heading>
        <Small>Weekly reports go out on the day and hour each person chose in Settings; a warning when the margin falls to Tight or Short.</Small>
        {list.length ? null : <Body>Nothing sent yet. Here is what your next weekly report would say if it went out now.</Body>}
        <Pressable role="button" aria-pressed={preview} onPress={() => { setOpenId(null); setPreviewing(!preview); }} style={[styles.row, preview && styles.rowOn]} testID="report-preview">
          <Text style={styles.subject}>Preview of the next report</Text>
          <Small>Made now from the rig as it is; nothing is sent.</Small>
        </Pressable>
        {list.map((e) => (
          <Pressable key={e.id} role="button" aria-pressed={e.id === openId} onPress={() => { setPreviewing(false); setOpenId(e.id === openId ? null : e.id); }} style={[styles.row, e.id === openId && styles.rowOn]} testID={`email-${e.id}`}>
            <Text style={styles.subject}>{e.subject}</Text>
            <Small>
              {KIND[e.kind]} to {e.recipient.name} · {new Date(e.sentAt).toLocaleString()}
            </Small>
          </Pressable>
        ))}
      </Card>
      {open ? (
        <View style={wide ? { flex: 3 } : undefined}>
          <EmailFrame rigId={rigId} emailId={open.id} title={open.subject} />
        </View>
      ) : preview ? (
        <View style={wide ? { flex: 3 } : undefined}>
          <ReportPreviewFrame rigId={rigId} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: TAP_MIN, paddingVertical: space.sm, paddingHorizontal: space.sm, borderRadius: radius.sm, gap: 2, borderTopWidth: 1, borderTopColor: colors.line },
  rowOn: { backgroundColor: colors.paper },
  subject: { ...type.heading, fontSize: 15, color: colors.ink },
});
