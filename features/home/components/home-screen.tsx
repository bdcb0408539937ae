import { StyleSheet, View } from 'react-native';

import { Body, Card, Heading, Small, Title } from '@/components/ui';
import { colors, space } from '@/shared/theme';
import { useHealthQuery } from '../api/get-health';

export function HomeScreen() {
  const health = useHealthQuery();
  return (
    <View style={styles.root} testID="home-screen">
      <Title>Your rigs, on one battery budget</Title>
      <Body>
        Keyoff projects your battery&apos;s state of charge hour by hour, tells you how many days you can stay parked
        before a safe cut-off, and which change buys you the most days.
      </Body>
      <Card>
        <Heading>Service</Heading>
        {health.isPending ? (
          <Small>Checking the service…</Small>
        ) : health.isError ? (
          <Small style={{ color: colors.short }}>The service cannot be reached right now.</Small>
        ) : (
          <Small testID="health-status">
            Service {health.data.status === 'ok' ? 'running' : 'degraded'}; database{' '}
            {health.data.database.connected ? 'connected' : 'not connected'}.
          </Small>
        )}
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({ root: { gap: space.lg } });
