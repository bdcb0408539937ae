import { StyleSheet } from 'react-native';

import { colors, radius, space, type } from '@/shared/theme';

/** The Readings cards' shared look. */
export const styles = StyleSheet.create({
  caution: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  figure: { ...type.figure, color: colors.night },
  row: { gap: 2, paddingVertical: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
  label: { ...type.heading, fontSize: 15, color: colors.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  chip: { minHeight: 44, minWidth: 44, justifyContent: 'center', borderWidth: 1, borderColor: colors.inkSoft, borderRadius: 999, paddingHorizontal: space.md, paddingVertical: space.xs, backgroundColor: colors.card, alignSelf: 'flex-start' },
  chipOn: { backgroundColor: colors.night, borderColor: colors.night },
  chipText: { ...type.small, color: colors.ink, fontFamily: 'Nunito_700Bold' },
  chipTextOn: { color: colors.paper },
  error: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  box: { width: 20, height: 20, borderRadius: 4, borderWidth: 1, borderColor: colors.night, alignItems: 'center', justifyContent: 'center' },
  boxOn: { backgroundColor: colors.night },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  photo: { width: 160, gap: 4 },
  thumb: { width: 160, height: 120, borderRadius: radius.sm, backgroundColor: colors.paper },
  link: { ...type.small, color: colors.focus, fontFamily: 'Nunito_700Bold' },
  status: { ...type.small, color: colors.comfortable, fontFamily: 'Nunito_700Bold' },
});
