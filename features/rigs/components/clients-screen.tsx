import { type ReactNode, useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { formatDays, formatWhen } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { PageTitle } from '@/components/page-title';
import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { colors, pressTarget, radius, space, type } from '@/shared/theme';
import { type Client, useClientsQuery } from '../api/clients';
import { OutlookScreen } from './outlook-screen';

type Props = {
  /** On a phone, opening a client goes to its rig (read-only tabs, Notes among them). */
  onOpen: (rigId: string) => void;
  /** On a wide screen the rig shows here with its Notes beside it; the route composes the Notes feature. */
  renderNotes: (rigId: string) => ReactNode;
};

/** Clients: every rig shared with me as an advisor, Short first, then Tight, then Comfortable. */
export function ClientsScreen({ onOpen, renderNotes }: Props) {
  const clients = useClientsQuery();
  const wide = useIsWide();
  const [selected, setSelected] = useState<string | null>(null);
  const open = clients.data?.find((c) => c.id === selected) ?? null;
  if (clients.isPending) return <ActivityIndicator color={colors.night} />;
  if (clients.isError) return <Body style={{ color: colors.short }}>{clients.error.message}</Body>;
  if (wide && open) {
    return (
      <View style={{ gap: space.lg }} testID="client-detail">
        <Pressable role="button" onPress={() => setSelected(null)} style={pressTarget} testID="back-to-clients">
          <Text style={styles.link}>← All clients</Text>
        </Pressable>
        <Title>{open.name}</Title>
        <Small>
          {open.householdName} · you are their advisor (read and comment only)
        </Small>
        <View style={{ flexDirection: 'row', gap: space.lg, alignItems: 'flex-start' }}>
          <View style={{ flex: 3, minWidth: 0 }}>
            <OutlookScreen rigId={open.id} narrow />
          </View>
          <View style={{ flex: 2, minWidth: 0, gap: space.md }}>
            <Heading>Notes</Heading>
            {renderNotes(open.id)}
          </View>
        </View>
      </View>
    );
  }
  return (
    <View style={{ gap: space.lg }} testID="clients-screen">
      <PageTitle parts={['Clients']} />
      <Title>Clients</Title>
      <Small>Rigs whose households invited you as their advisor: Short first, then Tight, then Comfortable.</Small>
      {clients.data.length ? null : (
        <Card>
          <Heading>No clients yet</Heading>
          <Body>When a household invites you as their advisor, their rig shows here.</Body>
        </Card>
      )}
      {clients.data.map((c) => (
        <ClientRow key={c.id} client={c} onPress={() => (wide ? setSelected(c.id) : onOpen(c.id))} />
      ))}
    </View>
  );
}

function ClientRow({ client, onPress }: { client: Client; onPress: () => void }) {
  return (
    <Pressable role="button" onPress={onPress} style={styles.row} testID={`client-${client.name}`}>
      <View style={{ flex: 1, minWidth: 160, gap: 2 }}>
        <Text style={styles.name}>{client.name}</Text>
        <Small>
          {client.householdName} · changed {formatWhen(client.updatedAt)}
        </Small>
      </View>
      <View style={{ alignItems: 'flex-end', gap: 4 }}>
        <MarginBadge state={client.marginState} />
        <Small>{formatDays(client.daysParked, client.horizonDays)} parked</Small>
        {client.unreadNotes ? (
          <Text style={styles.unread} testID={`unread-${client.name}`}>
            {client.unreadNotes} unread note{client.unreadNotes === 1 ? '' : 's'}
          </Text>
        ) : null}
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, backgroundColor: colors.card, borderWidth: 1, borderColor: colors.line, borderRadius: radius.lg, padding: space.lg },
  name: { ...type.heading, color: colors.ink },
  unread: { ...type.small, color: colors.night, fontFamily: 'Nunito_700Bold' },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15 },
});
