import { useState } from 'react';
import { Text, View } from 'react-native';

import { Body, Button, Card, Heading, Small } from '@/components/ui';
import type { Readings } from '../api/readings';
import { styles } from './styles';

const METHOD = {
  current: 'counted from the measured current (amp-hours over time)',
  monitor: "from the battery monitor's state of charge",
  voltage: 'a rough estimate from the fall in rested voltage',
} as const;

/** The drain the readings tell, and how it holds against the model over the same quiet hours. */
export function AnalysisCard({ readings, canEdit, onAdoptKeyOff }: { readings: Readings; canEdit: boolean; onAdoptKeyOff?: (a: number) => Promise<void> }) {
  const a = readings.analysis;
  const c = a.comparison;
  const [adopted, setAdopted] = useState<string | null>(null);
  return (
    <Card testID="analysis">
      <Heading>Measured drain</Heading>
      {a.drainA === null || !a.method ? (
        <Body>{a.reason}</Body>
      ) : (
        <>
          <Text style={styles.figure} testID="measured-drain">
            {a.rangeA ? `about ${a.drainA} A` : `${a.drainA} A`}
          </Text>
          <Small testID="drain-method">
            average over {a.hours} quiet hours, {METHOD[a.method]}
            {a.rangeA ? `: somewhere from ${a.rangeA[0]} to ${a.rangeA[1]} A` : ''}.
          </Small>
          {a.rangeA ? <Small>Measure the current (a clamp meter or a battery monitor) for a real figure.</Small> : null}
          {c ? (
            <>
              <Body testID="model-message">{c.message}</Body>
              {c.causes.length ? (
                <View style={{ gap: 2 }}>
                  <Small>Likely causes to check:</Small>
                  {c.causes.map((cause) => (
                    <Small key={cause}>• {cause}</Small>
                  ))}
                </View>
              ) : null}
              {canEdit && onAdoptKeyOff && c.suggestedKeyOffDrawA !== null && c.suggestedKeyOffDrawA !== a.keyOffDrawA ? (
                <Button
                  label={`Use ${c.suggestedKeyOffDrawA} A as the key-off draw`}
                  testID="adopt-key-off"
                  onPress={() => onAdoptKeyOff(c.suggestedKeyOffDrawA!).then(() => setAdopted(`The rig's key-off draw is now ${c.suggestedKeyOffDrawA} A.`), (e) => setAdopted(e.message))}
                />
              ) : null}
              {adopted ? <Text role="status" style={styles.status}>{adopted}</Text> : null}
            </>
          ) : null}
        </>
      )}
      {a.notes.map((n) => (
        <Small key={n}>{n}</Small>
      ))}
    </Card>
  );
}
