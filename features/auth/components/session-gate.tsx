import { type ReactNode, useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { type Href, Redirect, usePathname } from 'expo-router';

import { Body, Button } from '@/components/ui';
import { colors, space } from '@/shared/theme';
import { type Me, useMeQuery } from '../api/session';
import { useAccountUnits } from '../api/units';

/**
 * Guards the signed-in part of the app: a signed-out visitor goes to sign in and comes back here after.
 * (A client guard only hides screens; the server checks every request.) Signed in, this device's energy
 * unit follows the account's.
 */
export function SessionGate({ children }: { children: (me: Me) => ReactNode }) {
  const me = useMeQuery();
  useAccountUnits(me.data);
  // While the session loads no screen is mounted and the router falls back to "/": remember where the
  // visitor was going from the first render.
  const [pathname] = useState(usePathname());
  if (me.isPending) {
    return (
      <View style={styles.center} testID="session-loading">
        <ActivityIndicator color={colors.lamp} size="large" />
      </View>
    );
  }
  if (me.isError) {
    return (
      <View style={styles.center}>
        <Body style={{ color: colors.paper }}>Keyoff cannot be reached right now.</Body>
        <Button label="Try again" onPress={() => me.refetch()} />
      </View>
    );
  }
  if (!me.data) return <Redirect href={(pathname && pathname !== '/' ? `/sign-in?next=${encodeURIComponent(pathname)}` : '/sign-in') as Href} />;
  return <>{children(me.data)}</>;
}

const styles = StyleSheet.create({ center: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg, backgroundColor: colors.night } });
