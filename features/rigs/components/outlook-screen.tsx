import { Link } from 'expo-router';
import { ActivityIndicator, StyleSheet, Text, View } from 'react-native';

import { formatDays } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { OfflineNotice } from '@/components/offline-notice';
import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { energyInText, formatEnergy, useUnits } from '@/components/units';
import { useIsWide } from '@/components/use-layout';
import { FIX_TITLES } from '@/shared/control-labels';
import { fixGainText } from '@/shared/energy/project';
import { FIX_WIRING_CAUTION, needsWiringCaution } from '@/shared/safety';
import { colors, linkTarget, radius, space, type } from '@/shared/theme';
import { type Outlook, useOutlookQuery } from '../api/rig';
import { SocChart } from './chart/soc-chart';
import { OutlookBasis } from './outlook/outlook-basis';
import { SheetButton } from './outlook/sheet-button';
import { WorkedOut } from './outlook/worked-out';
import { TripStays } from './trip-stays';

/** Outlook: the headline figures, margin, the charge chart, the biggest drains, warnings and Fixes. */
/** `narrow`: lay out as on a phone even on a wide screen (the Outlook shares the width with Notes on Clients). */
export function OutlookScreen({ rigId, narrow = false }: { rigId: string; narrow?: boolean }) {
  const outlook = useOutlookQuery(rigId);
  const { units } = useUnits();
  const wide = useIsWide() && !narrow;
  if (outlook.isPending) return <ActivityIndicator color={colors.night} />;
  if (outlook.isError)
    return (
      <Card>
        <Body style={{ color: colors.short }}>The Outlook could not be computed: {outlook.error.message}</Body>
        <Button label="Try again" onPress={() => outlook.refetch()} />
      </Card>
    );
  const o = outlook.data;
  return (
    <View style={{ gap: space.lg }} testID="outlook-screen">
      <OfflineNotice path={`/api/rigs/${rigId}/outlook`} />
      <View style={[styles.figures, wide && { flexWrap: 'nowrap' }]}>
        <Figure label="Days parked" value={formatDays(o.parked.daysToCutoff, o.margin.coveredDays)} hint="to the cut-off, not driving at all" testID="figure-days-parked" />
        <Figure
          label="Days on your routine"
          value={o.routine.holds && o.routine.daysToCutoff === null ? 'Holds' : formatDays(o.routine.daysToCutoff, o.margin.coveredDays)}
          hint={o.routine.holds ? 'the repeating week puts back what it uses' : 'to the cut-off, driving as you do'}
          testID="figure-days-routine"
        />
        <Card style={styles.figureCard}>
          <Text style={styles.figureLabel}>Margin for a {o.margin.plannedStayDays}-day stay</Text>
          <MarginBadge state={o.margin.state} />
          <Small testID="margin-days">
            {o.margin.days !== null
              ? `${o.margin.days >= 0 ? '+' : ''}${o.margin.days.toFixed(1)} days`
              : o.margin.atLeastDays !== null
                ? `At least +${o.margin.atLeastDays.toFixed(1)} days: the cut-off is beyond the ${o.margin.coveredDays}-day run, but the routine does not hold.`
                : 'The routine holds: the cut-off is not reached.'}
          </Small>
        </Card>
      </View>
      <OutlookBasis rigId={rigId} />
      <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]}>
        <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
          <Card>
            <Heading>State of charge, {o.horizonDays} days</Heading>
            <SocChart series={o.series} cutoffSocPercent={o.cutoffSocPercent} startSocPercent={o.start.socPercent} />
            <Small>
              Solid dark line: on your routine. Dashed grey line: parked. Red line: cut-off at {o.cutoffSocPercent} %. Amber bands: driving. A line stops once the battery is flat.
            </Small>
          </Card>
          {o.trip ? (
            <Card testID="outlook-trip">
              <Heading>On the trip: {o.trip.name}</Heading>
              <Small>The trip is followed instead of the weekly routine until you set it aside on the Trips tab.</Small>
              <TripStays trip={o.trip} />
            </Card>
          ) : null}
          {o.warnings.length ? (
            <Card testID="warnings">
              <Heading>Warnings</Heading>
              {o.warnings.map((w) => (
                <Body key={w.code} style={{ color: colors.short }}>
                  ▲ {energyInText(w.message, units, o.assumptions.systemVoltage as number | undefined)}
                </Body>
              ))}
            </Card>
          ) : null}
          <Fixes outlook={o} />
        </View>
        <View style={wide ? { flex: 2 } : undefined}>
          <Drains outlook={o} />
        </View>
      </View>
      <WorkedOut rigId={rigId} outlook={o} />
      <SheetButton rigId={rigId} />
    </View>
  );
}

function Figure({ label, value, hint, testID }: { label: string; value: string; hint: string; testID: string }) {
  return (
    <Card style={styles.figureCard}>
      <Text style={styles.figureLabel}>{label}</Text>
      <Text style={styles.figureValue} testID={testID}>
        {value}
      </Text>
      <Small>{hint}</Small>
    </Card>
  );
}

function Drains({ outlook }: { outlook: Outlook }) {
  const { units } = useUnits();
  const V = outlook.assumptions.systemVoltage as number | undefined;
  const top = outlook.breakdown.slice(0, 8);
  const max = Math.max(...top.map((b) => b.ahPerDay), 0.001);
  return (
    <Card testID="drains">
      <Heading>Biggest drains</Heading>
      <Small>
        {formatEnergy(outlook.daily.consumptionAh, units, V)} a day used, {formatEnergy(outlook.daily.chargeAh, units, V)} put back.
      </Small>
      <Small testID="week-balance">
        The repeating week: {formatEnergy(outlook.balance.usedAh, units, V)} used, {formatEnergy(outlook.balance.putBackAh, units, V)} put back,{' '}
        {formatEnergy(outlook.balance.notStoredAh, units, V)} offered by the chargers but not stored
        {outlook.balance.heatingAh > 0 ? ` (${formatEnergy(outlook.balance.heatingAh, units, V)} of it warming the battery)` : ''}.
      </Small>
      {top.map((b) => (
        <View key={b.name} style={{ gap: 2 }}>
          <View style={styles.drainRow}>
            <Text style={styles.drainName}>
              {b.name}
              {b.kind === 'standby' ? ' (standby)' : ''}
            </Text>
            <Text style={styles.drainValue}>
              {formatEnergy(b.ahPerDay, units, V)}/day · {Math.round(b.share * 100)} %
            </Text>
          </View>
          <View style={styles.barTrack}>
            <View style={[styles.bar, { width: `${(b.ahPerDay / max) * 100}%`, backgroundColor: b.kind === 'standby' ? colors.lampDeep : colors.nightSoft }]} />
          </View>
        </View>
      ))}
    </Card>
  );
}

const INVERTER_FIXES = new Set(['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect']);

function Fixes({ outlook }: { outlook: Outlook }) {
  const { units } = useUnits();
  const V = outlook.assumptions.systemVoltage as number | undefined;
  return (
    <Card testID="fixes">
      <Heading>Fixes</Heading>
      {outlook.fixes.length === 0 ? <Small>Nothing to fix: no change gains days.</Small> : null}
      {outlook.fixes.map((f) => (
        <View key={f.kind} style={styles.fix} testID={`fix-${f.kind}`}>
          <Text style={styles.fixTitle}>
            {FIX_TITLES[f.kind] ?? f.kind}: {fixGainText(f)}
          </Text>
          <Body>{energyInText(f.summary, units, V)}</Body>
          {f.stops ? (
            <Small style={f.cutsEssential ? { color: colors.short, fontFamily: 'Nunito_700Bold' } : undefined} testID={`fix-stops-${f.kind}`}>
              Stops {f.stops.loads.map((n) => (f.stops!.essentialLoads.includes(n) ? `${n} (essential)` : n)).join(', ')}{' '}
              {f.stops.when === 'parked' ? 'whenever parked' : f.stops.fromDay !== null ? `once the battery runs low (from day ${f.stops.fromDay.toFixed(1)})` : 'once the battery runs low'}:{' '}
              {formatEnergy(f.stops.ahPerDayNotServed, units, V)} a day not served.
            </Small>
          ) : null}
          <Small>Cost in convenience: {energyInText(f.convenience, units, V)}</Small>
          <Link
            href={{ pathname: '/rigs/[rigId]/hookup', params: { rigId: outlook.rigId, fix: f.kind } }}
            style={styles.fixLink}
            testID={`fix-hookup-${f.kind}`}
          >
            {INVERTER_FIXES.has(f.kind) ? 'See its hook-up, preview or apply it' : 'Preview or apply it'}
          </Link>
        </View>
      ))}
      {needsWiringCaution(outlook.fixes) ? (
        <View style={styles.caution} role="note">
          <Small style={{ color: colors.ink }}>{FIX_WIRING_CAUTION}</Small>
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  figureCard: { flexGrow: 1, flexBasis: 200, gap: space.xs },
  figureLabel: { ...type.small, color: colors.inkSoft, fontFamily: 'Nunito_700Bold' },
  figureValue: { ...type.figure, color: colors.night },
  drainRow: { flexDirection: 'row', justifyContent: 'space-between', gap: space.sm },
  drainName: { ...type.body, color: colors.ink, flexShrink: 1 },
  drainValue: { ...type.small, color: colors.inkSoft },
  barTrack: { height: 8, backgroundColor: colors.paper, borderRadius: 4 },
  bar: { height: 8, borderRadius: 4 },
  fix: { gap: 2, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  fixLink: { ...type.body, fontFamily: 'Nunito_700Bold', color: colors.focus, textDecorationLine: 'underline', ...linkTarget },
  fixTitle: { ...type.heading, fontSize: 15, color: colors.ink },
  caution: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.md, padding: space.md },
});
