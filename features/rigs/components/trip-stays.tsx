import { StyleSheet, Text, View } from 'react-native';

import { formatDays } from '@/components/format';
import { MarginBadge } from '@/components/margin-badge';
import { Body, Small } from '@/components/ui';
import { colors, space, type } from '@/shared/theme';
import type { TripOutlookAnswer } from '../api/rig';

const when = (at: string) => {
  const d = new Date(`${at.slice(0, 10)}T12:00:00Z`);
  return `${d.toLocaleDateString('en-GB', { weekday: 'short', day: 'numeric', month: 'short', timeZone: 'UTC' })} ${at.slice(11, 16)}`;
};

/** The margin at each stay of a trip: charge on arrival and on leaving, days to the cut-off there. */
export function TripStays({ trip }: { trip: TripOutlookAnswer }) {
  return (
    <View style={{ gap: space.sm }} testID="trip-stays">
      {trip.stays.map((s) => (
        <View key={s.leg} style={styles.stay} testID={`stay-${s.name}`}>
          <View style={styles.head}>
            <Text style={styles.name}>{s.name}</Text>
            <MarginBadge state={s.marginState} />
          </View>
          <Small>
            {when(s.arriveAt)} → {when(s.leaveAt)} · {s.nights} {s.nights === 1 ? 'night' : 'nights'} · battery about {s.batteryTemperatureC.toFixed(0)} °C
            {s.shore ? ' · shore power' : ''}
            {s.sunAhPerDay > 0 ? ` · sun ${s.sunAhPerDay.toFixed(0)} Ah a day` : ''}
          </Small>
          <Text style={styles.figures} testID={`stay-figures-${s.name}`}>
            {s.socOnArrivalPercent.toFixed(0)} % on arrival → {s.socOnLeavingPercent.toFixed(0)} % on leaving
          </Text>
          <Small testID={`stay-margin-${s.name}`}>
            {s.arrivesBelowCutoff
              ? 'Arrives below the cut-off: an earlier leg runs the battery down.'
              : `Days to cut-off here: ${formatDays(s.daysToCutoff, s.nights + 7)}${s.marginDays === null ? '' : ` (margin ${s.marginDays >= 0 ? '+' : ''}${s.marginDays.toFixed(1)} days)`}`}
          </Small>
        </View>
      ))}
      {trip.warnings.map((w) => (
        <Body key={w.code} style={{ color: colors.short }}>
          ▲ {w.message}
        </Body>
      ))}
      {trip.fixes.length ? (
        <View style={{ gap: space.xs }} testID="trip-fixes">
          <Text style={styles.name}>Fixes for the stay at {trip.tightestStay}</Text>
          {trip.fixes.slice(0, 3).map((f) => (
            <Small key={f.kind}>• {f.summary}</Small>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stay: { gap: 2, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
  name: { ...type.heading, fontSize: 15, color: colors.ink },
  figures: { ...type.body, color: colors.night, fontFamily: 'Nunito_700Bold' },
});
