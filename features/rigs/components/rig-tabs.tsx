import { Link, type Href, usePathname } from 'expo-router';
import { Pressable, ScrollView, StyleSheet, Text, View } from 'react-native';

import { PageTitle } from '@/components/page-title';
import { Small, Title } from '@/components/ui';
import { colors, radius, space, type } from '@/shared/theme';
import { useRigQuery } from '../api/rig';

/** The rig's name and its screens; `unreadNotes` (from the Notes feature) shows on the Notes tab. */
export function RigTabs({ rigId, unreadNotes = 0 }: { rigId: string; unreadNotes?: number }) {
  const rig = useRigQuery(rigId);
  const pathname = usePathname();
  const tabs: { href: Href; label: string; path: string }[] = [
    { href: { pathname: '/rigs/[rigId]', params: { rigId } }, label: 'Outlook', path: `/rigs/${rigId}` },
    { href: { pathname: '/rigs/[rigId]/loads', params: { rigId } }, label: 'Loads', path: `/rigs/${rigId}/loads` },
    { href: { pathname: '/rigs/[rigId]/power', params: { rigId } }, label: 'Power', path: `/rigs/${rigId}/power` },
    { href: { pathname: '/rigs/[rigId]/hookup', params: { rigId } }, label: 'Hook-up', path: `/rigs/${rigId}/hookup` },
    { href: { pathname: '/rigs/[rigId]/try', params: { rigId } }, label: 'Try a load', path: `/rigs/${rigId}/try` },
    { href: { pathname: '/rigs/[rigId]/trips', params: { rigId } }, label: 'Trips', path: `/rigs/${rigId}/trips` },
    { href: { pathname: '/rigs/[rigId]/cable-runs', params: { rigId } }, label: 'Cable runs', path: `/rigs/${rigId}/cable-runs` },
    { href: { pathname: '/rigs/[rigId]/readings', params: { rigId } }, label: 'Readings', path: `/rigs/${rigId}/readings` },
    { href: { pathname: '/rigs/[rigId]/notes', params: { rigId } }, label: unreadNotes ? `Notes (${unreadNotes} new)` : 'Notes', path: `/rigs/${rigId}/notes` },
    { href: { pathname: '/rigs/[rigId]/people', params: { rigId } }, label: 'People', path: `/rigs/${rigId}/people` },
    { href: { pathname: '/rigs/[rigId]/history', params: { rigId } }, label: 'History', path: `/rigs/${rigId}/history` },
    { href: { pathname: '/rigs/[rigId]/reports', params: { rigId } }, label: 'Reports', path: `/rigs/${rigId}/reports` },
  ];
  const current = tabs.find((t) => t.path === pathname);
  return (
    <View style={{ gap: space.sm }}>
      <PageTitle parts={[current?.label.replace(/ \(.*\)$/, ''), rig.data?.name]} />
      <Title>{rig.data?.name ?? ' '}</Title>
      {rig.data ? (
        <Small>
          {rig.data.vehicle || 'Vehicle not given'} · {rig.data.householdName} · you are {rig.data.role}
          {rig.data.role === 'advisor' ? ' (read and comment only)' : ''}
        </Small>
      ) : null}
      <ScrollView horizontal showsHorizontalScrollIndicator={false} contentContainerStyle={styles.row} role="tablist">
        {tabs.map((t) => {
          const on = pathname === t.path;
          return (
            <Link key={t.path} href={t.href} asChild>
              <Pressable role="tab" aria-selected={on} testID={`tab-${t.label.replace(/ \(.*\)$/, '')}`} style={StyleSheet.flatten([styles.tab, on && styles.tabOn])}>
                <Text style={[styles.label, on && styles.labelOn]}>{t.label}</Text>
              </Pressable>
            </Link>
          );
        })}
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.xs },
  tab: { minHeight: 44, justifyContent: 'center', paddingHorizontal: space.lg, paddingVertical: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.card },
  tabOn: { backgroundColor: colors.night, borderColor: colors.night },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  labelOn: { color: colors.paper },
});
