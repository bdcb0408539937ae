import type { ReactNode } from 'react';
import { Image, ScrollView, StyleSheet, Text, View } from 'react-native';

import { PageTitle } from '@/components/page-title';
import { Card, Title } from '@/components/ui';
import { colors, linkTarget, space, type } from '@/shared/theme';

const mark = require('@/assets/images/mark.png');

export function AuthFrame({ title, children, testID }: { title: string; children: ReactNode; testID?: string }) {
  return (
    <ScrollView style={styles.root} contentContainerStyle={styles.inner} testID={testID}>
      <PageTitle parts={[title]} />
      <View style={styles.brand}>
        <Image source={mark} style={styles.mark} accessibilityLabel="" />
        <Text style={styles.brandName}>Keyoff</Text>
      </View>
      <Card style={styles.card}>
        <Title>{title}</Title>
        {children}
      </Card>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.night },
  inner: { flexGrow: 1, alignItems: 'center', justifyContent: 'center', padding: space.lg, gap: space.xl },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  mark: { width: 44, height: 44, borderRadius: 10 },
  brandName: { ...type.display, color: colors.paper },
  card: { width: '100%', maxWidth: 440, gap: space.md },
});

export const linkStyle = { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15, ...linkTarget } as const;
/** A sentence and its link side by side (the link keeps its own 44 px target). */
export const rowStyle = { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: 6 } as const;
export const alertStyle = { ...type.body, color: colors.short } as const;
export const okStyle = { ...type.body, color: colors.comfortable } as const;
