import { View } from 'react-native';

import { Body, Card, Heading, Small } from '@/components/ui';
import { type Readings, useSpotReadingDeleteMutation } from '../api/readings';
import { styles } from './styles';
import { DeleteButton } from './toggle';

const PLACE: Record<string, string> = { terminals: 'battery posts', device: 'at a device', ground: 'at a ground point' };

export function SpotList({ rigId, readings }: { rigId: string; readings: Readings }) {
  const remove = useSpotReadingDeleteMutation(rigId);
  if (!readings.spot.length) return null;
  return (
    <Card testID="spot-list">
      <Heading>Typed readings</Heading>
      {readings.spot.slice(0, 20).map((s) => (
        <View key={s.id} style={styles.row} testID={`spot-${s.id}`}>
          <Body>
            {s.voltageV} V{s.currentA !== null ? ` · ${s.currentA} A` : ''}
            {s.socPercent !== null ? ` · ${Math.round(s.socPercent)} %` : ''}
            {s.rested ? ' · rested' : ''}
          </Body>
          <Small>
            {new Date(s.at).toLocaleString()} · {PLACE[s.place] ?? s.place}
            {s.by ? ` · ${s.by}` : ''}
            {s.note ? ` · ${s.note}` : ''}
          </Small>
          {s.canDelete ? <DeleteButton label="Delete reading" onDelete={() => remove.mutate(s.id)} testID={`delete-spot-${s.id}`} /> : null}
        </View>
      ))}
      {remove.error ? <Small style={styles.error}>{remove.error.message}</Small> : null}
    </Card>
  );
}
