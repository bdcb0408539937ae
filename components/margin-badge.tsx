import { StyleSheet, Text, View } from 'react-native';

import type { MarginState } from '@/shared/energy/project';
import { radius, space, type } from '@/shared/theme';
import { MARGIN_COLOR, MARGIN_LABEL } from './format';

// Our margin marks: a word always, with a shape that differs per state (not colour alone).
const MARK: Record<MarginState, string> = { comfortable: '●', tight: '◆', short: '▲' };

export function MarginBadge({ state }: { state: MarginState }) {
  return (
    <View style={[styles.badge, { borderColor: MARGIN_COLOR[state] }]} testID={`margin-${state}`}>
      <Text style={[styles.text, { color: MARGIN_COLOR[state] }]}>
        {MARK[state]} {MARGIN_LABEL[state]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: { borderWidth: 1.5, borderRadius: radius.sm, paddingHorizontal: space.sm, paddingVertical: 2, alignSelf: 'flex-start' },
  text: { ...type.small, fontFamily: 'Nunito_700Bold' },
});
