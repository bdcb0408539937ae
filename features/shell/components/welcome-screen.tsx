import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';

import { Body, Card, Small, Title } from '@/components/ui';
import { colors, space } from '@/shared/theme';

/** The signed-out landing page of the (auth) group; sign-in and sign-up join it with accounts. */
export function WelcomeScreen() {
  return (
    <View style={styles.root}>
      <Card style={styles.card}>
        <Title>Welcome to Keyoff</Title>
        <Body>
          Keep your vehicle&apos;s electrical budget: list what draws from the battery, see how many days you can stay
          parked, and what to change to stay longer.
        </Body>
        <Small>Accounts and shared rigs are being built. Meanwhile the home page and the cable-run calculator are open.</Small>
        <Link href="/" style={styles.link}>
          Go to Keyoff
        </Link>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  card: { maxWidth: 520, width: '100%' },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15 },
});
