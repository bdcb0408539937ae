import { useState } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, View } from 'react-native';

import { Body, Button, Card, Heading, Small } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import type { Trip, TripInput } from '@/shared/schemas/trip';
import { colors, space, TAP_MIN, type } from '@/shared/theme';
import { useRigQuery } from '../api/rig';
import { type SavedTrip, useTripCreateMutation, useTripDeleteMutation, useTripOutlookQuery, useTripsQuery, useTripUpdateMutation } from '../api/trips';
import { TripChart } from './chart/trip-chart';
import { NEW_TRIP, TripForm } from './trip-form';
import { TripStays } from './trip-stays';

/** Trips: dated stays and drives, each stay with the sun and the cold of its place and month. */
export function TripsScreen({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  const trips = useTripsQuery(rigId);
  const wide = useIsWide();
  const [editing, setEditing] = useState<SavedTrip | 'new' | null>(null);
  const [open, setOpen] = useState<string | null>(null);
  const create = useTripCreateMutation(rigId);
  const update = useTripUpdateMutation(rigId);
  const remove = useTripDeleteMutation(rigId);
  if (rig.isPending || trips.isPending) return <ActivityIndicator color={colors.night} />;
  if (rig.isError || trips.isError) return <Body style={{ color: colors.short }}>{(rig.error ?? trips.error)?.message}</Body>;
  const canEdit = rig.data.permissions.manageTrips;
  const shown = open ?? trips.data.trips.find((t) => t.active)?.id ?? null;
  const save = async (trip: Trip) => {
    const saved = editing === 'new' ? await create.mutateAsync(trip) : editing ? await update.mutateAsync({ id: editing.id, trip }) : null;
    setEditing(null);
    if (saved) setOpen(saved.id);
  };
  return (
    <View style={[{ gap: space.lg }, wide && { flexDirection: 'row', alignItems: 'flex-start' }]} testID="trips-screen">
      <View style={[{ gap: space.lg }, wide && { flex: 3 }]}>
        <Card>
          <View style={styles.head}>
            <Heading>Trips</Heading>
            {canEdit && !editing ? <Button testID="add-trip" label="Plan a trip" onPress={() => setEditing('new')} /> : null}
          </View>
          {trips.data.trips.length === 0 ? <Small>No trips yet. A trip budgets each stay with the sun and the cold of its place and month.</Small> : null}
          {trips.data.trips.map((t) => (
            <View key={t.id} style={styles.trip} testID={`trip-${t.name}`}>
              <Pressable role="button" aria-expanded={shown === t.id} onPress={() => setOpen(t.id)} style={{ flex: 1, minWidth: 200 }}>
                <Text style={styles.name}>
                  {t.name}
                  {t.active ? ' · followed' : ''}
                </Text>
                <Small>
                  From {t.startDate} · {count(t.legs.filter((l) => l.kind === 'stay').length, 'stay')} · {count(t.legs.filter((l) => l.kind === 'drive').length, 'drive')}
                </Small>
              </Pressable>
              {canEdit ? (
                <View style={{ flexDirection: 'row', gap: space.xs }}>
                  <Pressable role="button" aria-label={`Edit ${t.name}`} onPress={() => setEditing(t)} style={styles.chip}>
                    <Text style={styles.chipText}>Edit</Text>
                  </Pressable>
                  <Pressable role="button" aria-label={`Delete ${t.name}`} onPress={() => remove.mutate(t.id)} style={styles.chip}>
                    <Text style={styles.chipText}>Delete</Text>
                  </Pressable>
                </View>
              ) : null}
            </View>
          ))}
        </Card>
        {shown && !editing ? <TripOutlookCard rigId={rigId} tripId={shown} /> : null}
      </View>
      {editing ? (
        <View style={wide ? { flex: 2 } : undefined}>
          <TripForm
            key={editing === 'new' ? 'new' : editing.id}
            initial={editing === 'new' ? NEW_TRIP() : toForm(editing)}
            places={trips.data.recentPlaces}
            busy={create.isPending || update.isPending}
            onSubmit={save}
            onCancel={() => setEditing(null)}
          />
        </View>
      ) : null}
    </View>
  );
}

const count = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
const toForm = ({ id: _id, ...trip }: SavedTrip): TripInput => trip;

function TripOutlookCard({ rigId, tripId }: { rigId: string; tripId: string }) {
  const outlook = useTripOutlookQuery(rigId, tripId);
  if (outlook.isPending) return <ActivityIndicator color={colors.night} />;
  if (outlook.isError) return <Body style={{ color: colors.short }}>{outlook.error.message}</Body>;
  const o = outlook.data;
  return (
    <Card testID="trip-outlook">
      <Heading>{o.name}: the margin at each stay</Heading>
      <Small>
        Ends at {o.endSocPercent.toFixed(0)} % (cut-off {o.cutoffSocPercent} %). Each stay&apos;s sun comes from its latitude and dates (FAO-56), its battery temperature from the expected low and high.
      </Small>
      <TripChart series={o.series} stays={o.stays} drives={o.drives} cutoffSocPercent={o.cutoffSocPercent} />
      <TripStays trip={o} />
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center' },
  trip: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line, alignItems: 'flex-start' },
  name: { ...type.heading, fontSize: 15, color: colors.ink },
  chip: { minHeight: TAP_MIN, justifyContent: 'center', borderWidth: 1, borderColor: colors.line, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
});
