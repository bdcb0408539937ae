import { Link } from 'expo-router';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { formatDays, formatWhen } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { OfflineNotice } from '@/components/offline-notice';
import { PageTitle } from '@/components/page-title';
import { Body, Button, Card, Heading, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { colors, pressTarget, space, type } from '@/shared/theme';
import { type RigSummary, useRigsQuery } from '../api/get-rigs';

/** Rigs (home): each rig with its Days parked, margin state and last change. */
/** Without `onNewRig` (an admin's home) there is no New rig, only the rigs shared with the account. */
export function RigsScreen({ onNewRig }: { onNewRig?: () => void }) {
  const rigs = useRigsQuery();
  const wide = useIsWide();
  return (
    <View style={styles.root} testID="home-screen">
      <PageTitle parts={['Rigs']} />
      <View style={styles.header}>
        <Title>Your rigs</Title>
        {onNewRig ? <Button testID="new-rig" label="New rig" onPress={onNewRig} /> : null}
      </View>
      <OfflineNotice path="/api/rigs" />
      {rigs.isPending ? (
        <ActivityIndicator color={colors.night} />
      ) : rigs.isError ? (
        <Card>
          <Body style={{ color: colors.short }}>Your rigs could not be loaded.</Body>
          <Button label="Try again" onPress={() => rigs.refetch()} />
        </Card>
      ) : rigs.data.length === 0 && !onNewRig ? (
        <Small>No household has shared a rig with you.</Small>
      ) : rigs.data.length === 0 ? (
        <Card testID="rigs-empty">
          <Heading>No rig yet</Heading>
          <Body>Set up your vehicle&apos;s battery, inverter and charging, and see how many days you can stay parked.</Body>
        </Card>
      ) : (
        <View style={[styles.grid, wide && styles.gridWide]}>
          {rigs.data.map((rig) => (
            <RigCard key={rig.id} rig={rig} wide={wide} />
          ))}
        </View>
      )}
    </View>
  );
}

function RigCard({ rig, wide }: { rig: RigSummary; wide: boolean }) {
  return (
    <Card style={wide ? styles.cardWide : undefined}>
      <View style={styles.cardTop}>
        <View style={{ flex: 1 }}>
          <Heading>{rig.name}</Heading>
          <Small>
            {rig.vehicle || 'Vehicle not given'} · {rig.householdName} · you are {rig.role}
          </Small>
        </View>
        <MarginBadge state={rig.marginState} />
      </View>
      <View style={styles.figure}>
        <Text style={styles.figureValue} testID={`days-parked-${rig.name}`}>
          {formatDays(rig.daysParked, rig.horizonDays)}
        </Text>
        <Text style={styles.figureLabel}>Days parked</Text>
      </View>
      <Small>
        {rig.loadCount} loads · changed {formatWhen(rig.updatedAt)}
      </Small>
      <View style={{ flexDirection: 'row', gap: space.lg }}>
        <Link href={{ pathname: '/rigs/[rigId]', params: { rigId: rig.id } }} asChild>
          <Pressable role="link" style={pressTarget} testID={`open-${rig.name}`}>
            <Text style={styles.link}>Open the Outlook</Text>
          </Pressable>
        </Link>
        <Link href={{ pathname: '/rigs/[rigId]/people', params: { rigId: rig.id } }} asChild>
          <Pressable role="link" style={pressTarget} testID={`people-${rig.name}`}>
            <Text style={styles.link}>People</Text>
          </Pressable>
        </Link>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  header: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  grid: { gap: space.lg },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cardWide: { width: '48%' },
  cardTop: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  figure: { gap: 2 },
  figureValue: { ...type.figure, color: colors.night },
  figureLabel: { ...type.small, color: colors.inkSoft },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15 },
});
