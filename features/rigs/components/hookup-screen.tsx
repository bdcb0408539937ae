import { type Href, Link } from 'expo-router';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { Body, Card, Heading, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { CONTROL_PHRASES, FIX_CONTROL, INVERTER_FIX_NAMES } from '@/shared/control-labels';
import type { FixKind } from '@/shared/energy/project';
import { FIX_WIRING_CAUTION } from '@/shared/safety';
import { colors, radius, space, type } from '@/shared/theme';
import { type RigHookup, useHookupQuery } from '../api/hookup';
import { useOutlookQuery } from '../api/rig';
import { FixActions } from './hookup/fix-actions';
import { Schematic } from './hookup/schematic';

const FIX_KINDS: FixKind[] = ['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect', 'more-driving', 'more-battery', 'solar'];

/** Hook-up: the inverter's circuit drawn with every part rated, now and as a chosen Fix would change it. */
export function HookupScreen({ rigId, fix }: { rigId: string; fix: FixKind | null }) {
  const wide = useIsWide();
  const outlook = useOutlookQuery(rigId);
  const inverterFixes = (outlook.data?.fixes ?? []).filter((f) => FIX_CONTROL[f.kind]);
  const chosen = fix && FIX_CONTROL[fix] ? fix : null;
  // A Fix that leaves the hook-up as it is (more battery, solar, driving) is still previewed and applied here.
  const other = fix && !chosen && FIX_KINDS.includes(fix) ? fix : null;
  const now = useHookupQuery(rigId, null);
  const withFix = useHookupQuery(rigId, chosen ? FIX_CONTROL[chosen]! : null, chosen !== null);
  if (now.isPending) return <ActivityIndicator color={colors.night} />;
  if (now.isError) {
    return (
      <Card testID="hookup-screen">
        <Body>{now.error.message}</Body>
        <Small>Add an inverter under Power to see its hook-up.</Small>
      </Card>
    );
  }
  const fixLink = (kind: FixKind | null): Href => ({ pathname: '/rigs/[rigId]/hookup', params: kind ? { rigId, fix: kind } : { rigId } });
  return (
    <View style={{ gap: space.lg }} testID="hookup-screen">
      {inverterFixes.length ? (
        <View style={styles.chips} role="tablist" aria-label="Show the hook-up with a Fix">
          <Small>Beside it, with a Fix:</Small>
          {[null, ...inverterFixes.map((f) => f.kind)].map((kind) => {
            const on = kind === chosen;
            return (
              <Link key={kind ?? 'none'} href={fixLink(kind)} asChild>
                <Pressable role="tab" aria-selected={on} style={StyleSheet.flatten([styles.chip, on && styles.chipOn])} testID={`hookup-fix-${kind ?? 'none'}`}>
                  <Text style={[styles.chipLabel, on && styles.chipLabelOn]}>{kind ? INVERTER_FIX_NAMES[kind] : 'None'}</Text>
                </Pressable>
              </Link>
            );
          })}
        </View>
      ) : null}
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <PlanCard title={`Now: ${CONTROL_PHRASES[now.data.control]}, ${now.data.connection === 'socket' ? 'plugged into a socket' : 'wired to the battery'}`} plan={now.data} testID="hookup-now" wide={wide} />
        {chosen ? (
          withFix.data ? (
            <View style={[{ gap: space.lg }, wide && { flex: 1 }]}>
              <PlanCard title={`With this Fix: ${INVERTER_FIX_NAMES[chosen]}`} plan={withFix.data} testID="hookup-fix" wide={wide} />
              <FixActions rigId={rigId} kind={chosen} />
            </View>
          ) : (
            <ActivityIndicator color={colors.night} />
          )
        ) : other ? (
          <View style={wide ? { flex: 1 } : undefined}>
            <FixActions rigId={rigId} kind={other} />
          </View>
        ) : null}
      </View>
      <View style={styles.caution} role="note" testID="hookup-cautions">
        {now.data.cautions.map((c) => (
          <Small key={c} style={{ color: colors.ink }}>
            {c}
          </Small>
        ))}
        <Small style={{ color: colors.ink }}>{FIX_WIRING_CAUTION}</Small>
      </View>
    </View>
  );
}

function PlanCard({ title, plan, testID, wide }: { title: string; plan: RigHookup; testID: string; wide: boolean }) {
  const f = plan.feed;
  return (
    <Card testID={testID} style={wide ? { flex: 1 } : undefined}>
      <Heading>{title}</Heading>
      <Small>
        Feed: {f.currentA} A at full output near the {f.cutOutV} V cut-out, {f.continuousA} A as a continuous load
        {f.awg ? `; ${f.awg} AWG (${f.mm2} mm²) over ${f.lengthM} m, ${f.dropPercent?.toFixed(2)} % drop` : ''}
        {f.fuseA ? `; protection ${f.fuseA} A` : ''}.{plan.feedRun ? ` Length from the cable run “${plan.feedRun.label}”.` : ''}
      </Small>
      <Schematic plan={plan} testID={`${testID}-drawing`} />
      {plan.warnings.map((w) => (
        <Body key={w.code} style={{ color: colors.short }} testID={`hookup-warning-${w.code}`}>
          ▲ {w.message}
        </Body>
      ))}
      <Text style={styles.subheading}>Why these ratings</Text>
      {plan.parts
        .filter((p) => p.notes.length)
        .map((p, i) => (
          <View key={`${p.kind}-${i}`} style={styles.note}>
            <Text style={styles.noteTitle}>{p.label}</Text>
            {p.notes.map((n) => (
              <Small key={n}>{n}</Small>
            ))}
          </View>
        ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  chip: { paddingHorizontal: space.md, paddingVertical: space.sm, borderRadius: radius.md, borderWidth: 1, borderColor: colors.line, backgroundColor: colors.card, minHeight: 44, justifyContent: 'center' },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipLabel: { ...type.body, fontFamily: 'Nunito_700Bold', color: colors.ink },
  chipLabelOn: { color: colors.paper },
  subheading: { ...type.heading, fontSize: 15, color: colors.ink, marginTop: space.sm },
  note: { gap: 2, paddingVertical: space.xs, borderTopWidth: 1, borderTopColor: colors.line },
  noteTitle: { ...type.small, fontFamily: 'Nunito_700Bold', color: colors.ink },
  caution: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
});
