import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet } from 'react-native';

import { Body, Button, Card, Title } from '@/components/ui';
import { ApiError } from '@/lib/api-client';
import { colors, linkTarget } from '@/shared/theme';
import { useRigQuery } from '../api/rig';

/**
 * The rig's screens only once the rig has been read. A rig that does not exist or is not shared with the
 * caller (the server answers both with 404, so rigs cannot be discovered) gets one plain card and a way home.
 */
export function RigGate({ rigId, children }: { rigId: string; children: ReactNode }) {
  const rig = useRigQuery(rigId);
  if (rig.isPending) return <ActivityIndicator color={colors.night} />;
  if (rig.isError && rig.error instanceof ApiError && rig.error.status === 404) {
    return (
      <Card testID="rig-not-shared">
        <Title>This rig doesn&apos;t exist or isn&apos;t shared with you</Title>
        <Body>If someone meant to share it, ask them to invite you from its People screen.</Body>
        <Link href="/" style={styles.link} testID="go-home">
          Back to your rigs
        </Link>
      </Card>
    );
  }
  if (rig.isError)
    return (
      <Card>
        <Body style={{ color: colors.short }}>This rig could not be loaded: {rig.error.message}</Body>
        <Button label="Try again" onPress={() => rig.refetch()} />
      </Card>
    );
  return children;
}

const styles = StyleSheet.create({ link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15, ...linkTarget } });
