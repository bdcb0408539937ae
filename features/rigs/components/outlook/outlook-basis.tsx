import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';

import { Small } from '@/components/ui';
import { routineOf } from '@/shared/routines';
import { colors, linkTarget, space, type } from '@/shared/theme';
import { useRigQuery } from '../../api/rig';

/** What the Outlook's figures assume about driving and staying, named, with the way to change them. */
export function OutlookBasis({ rigId }: { rigId: string }) {
  const rig = useRigQuery(rigId);
  if (!rig.data) return null;
  const p = rig.data.power;
  const routine = routineOf(p.charging);
  return (
    <View style={styles.row} testID="outlook-basis">
      <Text style={styles.text}>
        On <Text style={styles.strong} testID="outlook-routine">{routine.name}</Text> ({routine.description}) for a planned stay of{' '}
        <Text style={styles.strong}>{p.plannedStayDays} days</Text>.
      </Text>
      <Link href={{ pathname: '/rigs/[rigId]/power', params: { rigId } }} style={styles.link} testID="change-routine">
        {rig.data.permissions.edit ? 'Change the routine or stay' : 'See them on Power'}
      </Link>
      {routine.key === 'own' ? null : <Small>A named starting point; adjust its minutes on Power to match your week.</Small>}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs },
  text: { ...type.body, color: colors.ink },
  strong: { fontFamily: 'Nunito_700Bold' },
  link: { color: colors.focus, fontFamily: 'Nunito_700Bold', fontSize: 15, ...linkTarget },
});
