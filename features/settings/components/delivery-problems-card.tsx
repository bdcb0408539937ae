import { ActivityIndicator, View } from 'react-native';

import { Body, Card, Heading, Small } from '@/components/ui';
import { colors, space } from '@/shared/theme';
import { useEmailFailuresQuery } from '../api/email-prefs';

/** For admins: e-mails whose last attempt failed (they are retried with backoff); no budget figures. */
export function DeliveryProblemsCard() {
  const failures = useEmailFailuresQuery(true);
  return (
    <Card testID="delivery-problems">
      <Heading>E-mail delivery (admin)</Heading>
      {failures.isPending ? <ActivityIndicator color={colors.night} /> : null}
      {failures.isError ? <Body style={{ color: colors.short }}>{failures.error.message}</Body> : null}
      {failures.data && !failures.data.length ? <Small>No failed e-mails.</Small> : null}
      {failures.data?.map((f) => (
        <View key={f.id} style={{ gap: 2, paddingVertical: space.xs }}>
          <Body>
            {f.kind} to {f.to ?? 'unknown'} · {f.attempts} attempt{f.attempts === 1 ? '' : 's'}
          </Body>
          <Small>{f.error}</Small>
        </View>
      ))}
    </Card>
  );
}
