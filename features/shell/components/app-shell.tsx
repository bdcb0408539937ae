import { type ReactNode, useEffect } from 'react';
import { Image, Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';
import { Link, usePathname, type Href } from 'expo-router';
import { useQueryClient } from '@tanstack/react-query';
import { SafeAreaView } from 'react-native-safe-area-context';

import { useIsWide } from '@/components/use-layout';
import { registerServiceWorker } from '@/lib/service-worker';
import { colors, space, type } from '@/shared/theme';

const mark = require('@/assets/images/mark.png');

const destinations: { href: Href; label: string; advisorOnly?: boolean }[] = [
  { href: '/', label: 'Rigs' },
  { href: '/clients', label: 'Clients', advisorOnly: true },
  { href: '/cable-runs', label: 'Wire a circuit' },
  { href: '/settings', label: 'Settings' },
];

/** Phone first: a top bar and a bottom bar; from WIDE_BREAKPOINT a side rail beside the content. */
/** `advisor`: show Clients (an advisor account, or anyone advising some household). */
export function AppShell({ children, account, accountCompact, advisor = false }: { children: ReactNode; account?: ReactNode; accountCompact?: ReactNode; advisor?: boolean }) {
  const wide = useIsWide();
  const pathname = usePathname();
  const queryClient = useQueryClient();
  // Only signed in: what is kept for offline is the signed-in app (the sign-in screen stays light).
  useEffect(() => registerServiceWorker(() => void queryClient.invalidateQueries()), [queryClient]);

  const nav = destinations.filter((d) => advisor || !d.advisorOnly).map((d) => {
    const active = pathname === d.href;
    return (
      <Link key={d.label} href={d.href} asChild>
        <Pressable
          role="link"
          aria-current={active ? 'page' : undefined}
          style={StyleSheet.flatten([wide ? styles.railItem : styles.tabItem, active && styles.active])}
        >
          <Text style={[styles.navLabel, active && styles.navLabelActive]}>{d.label}</Text>
        </Pressable>
      </Link>
    );
  });

  if (wide) {
    return (
      <View style={styles.wideRoot} testID="shell-wide">
        <View style={styles.rail} role="navigation">
          <View style={styles.brand}>
            <Image source={mark} style={styles.mark} accessibilityLabel="Keyoff" />
            <Text style={styles.brandName}>Keyoff</Text>
          </View>
          {nav}
          <View style={{ flex: 1 }} />
          {account}
        </View>
        <ScrollView style={styles.content} contentContainerStyle={styles.contentInnerWide}>
          {children}
        </ScrollView>
      </View>
    );
  }

  return (
    <SafeAreaView style={styles.phoneRoot} testID="shell-phone">
      <View style={styles.topBar}>
        <Image source={mark} style={styles.markSmall} accessibilityLabel="Keyoff" />
        <Text style={styles.brandName}>Keyoff</Text>
        <View style={{ flex: 1 }} />
        {accountCompact}
      </View>
      <ScrollView style={styles.content} contentContainerStyle={styles.contentInner}>
        {children}
      </ScrollView>
      <View style={styles.tabBar} role="navigation">
        {nav}
      </View>
    </SafeAreaView>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.paper },
  rail: { width: 220, backgroundColor: colors.night, paddingVertical: space.xl, paddingHorizontal: space.md, gap: space.xs },
  brand: { flexDirection: 'row', alignItems: 'center', gap: space.sm, marginBottom: space.xl, paddingHorizontal: space.sm },
  mark: { width: 40, height: 40, borderRadius: 9 },
  markSmall: { width: 30, height: 30, borderRadius: 7 },
  brandName: { ...type.title, color: colors.paper },
  railItem: { paddingVertical: space.md, paddingHorizontal: space.md, borderRadius: 8 },
  active: { backgroundColor: colors.nightSoft },
  navLabel: { ...type.heading, color: '#C9D6E2' },
  navLabelActive: { color: colors.lamp },
  content: { flex: 1 },
  contentInner: { padding: space.lg, gap: space.lg },
  contentInnerWide: { padding: space.xxl, gap: space.xl, maxWidth: 1200, width: '100%' },
  phoneRoot: { flex: 1, backgroundColor: colors.paper },
  topBar: { flexDirection: 'row', alignItems: 'center', gap: space.sm, backgroundColor: colors.night, paddingHorizontal: space.lg, paddingVertical: space.md },
  tabBar: { flexDirection: 'row', backgroundColor: colors.night, justifyContent: 'space-around' },
  tabItem: { flex: 1, alignItems: 'center', paddingVertical: space.md },
});
