import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';

import { Body, Card, Title } from '@/components/ui';
import { colors, linkTarget, space } from '@/shared/theme';

export function NotFoundScreen() {
  return (
    <View style={styles.root}>
      <Card style={styles.card}>
        <Title>Nothing on this circuit</Title>
        <Body>The page you asked for does not exist, or has moved.</Body>
        <Link href="/" style={styles.link}>
          Back to Keyoff
        </Link>
      </Card>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.paper, alignItems: 'center', justifyContent: 'center', padding: space.lg },
  card: { maxWidth: 480, width: '100%' },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15, ...linkTarget },
});
