import { StyleSheet, Text, View } from 'react-native';

import { HOOKUP_SYMBOL_WIDTH as W } from '@/components/wiring/drawing-types';
import { useDrawings } from '@/components/wiring/lazy-drawings';
import type { HookupPart } from '@/shared/energy/hookup/plan';
import { colors, radius, space, type } from '@/shared/theme';
import type { RigHookup } from '../../api/hookup';

// Keyoff's hook-up drawing: the positive feed runs down a rail from the battery to the inverter, the
// return runs beside it on the left; each part sits on its rail with its label and rating to the right.
// One row per part, so labels wrap on a phone and the rails stay joined whatever the row's height.
// The parts' symbols are SVG (HookupSymbol in components/wiring/drawings-impl.tsx, loaded lazily on the
// web); the labels set the rows' heights, so the rows stand where they will be before the symbols arrive.

type Row = { part: HookupPart; detail: string | null };

/** The plan's parts in drawing order: battery first, the return just above the inverter it comes back from. */
function rowsOf(plan: RigHookup): Row[] {
  const ret = plan.parts.find((p) => p.kind === 'return');
  const inverter = plan.parts.find((p) => p.kind === 'inverter');
  const rest = plan.parts.filter((p) => p !== ret && p !== inverter);
  const ordered = [...rest, ...(ret ? [ret] : []), ...(inverter ? [inverter] : [])];
  return ordered.map((part) => ({ part, detail: detailOf(part, plan) }));
}

function detailOf(part: HookupPart, plan: RigHookup): string | null {
  if (part.kind === 'conductor' && plan.feed.dropPercent !== null) return `carries ${part.ratingA} A · drop ${plan.feed.dropPercent.toFixed(2)} % at ${plan.feed.currentA} A`;
  if (part.kind === 'inverter') return `draws up to ${part.ratingA} A at ${plan.feed.cutOutV} V`;
  if (part.kind === 'battery' || part.ratingA === null) return null;
  if (part.kind === 'return') return `carries ${part.ratingA} A`;
  return `rated ${part.ratingA} A`;
}

export function Schematic({ plan, testID }: { plan: RigHookup; testID?: string }) {
  const drawings = useDrawings();
  const chassis = plan.feed.returnPath === 'chassis';
  return (
    <View testID={testID} role="img" aria-label={`Hook-up drawing: ${plan.parts.map((p) => p.label).join(', ')}`} style={styles.frame}>
      {rowsOf(plan).map(({ part, detail }, i) => (
        <View key={`${part.kind}-${i}`} style={styles.row} testID={`hookup-part-${part.kind}`}>
          <View style={styles.symbol}>{drawings ? <drawings.HookupSymbol part={part} chassis={chassis} /> : null}</View>
          <View style={styles.label}>
            <Text style={styles.partLabel}>{part.label}</Text>
            {detail ? <Text style={styles.partDetail}>{detail}</Text> : null}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  frame: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.paper, paddingVertical: space.sm },
  row: { flexDirection: 'row', minHeight: 66 },
  // The drawing fills the row's height without setting it: the label decides how tall a row is.
  symbol: { position: 'absolute', top: 0, bottom: 0, left: 0, width: W },
  label: { flex: 1, marginLeft: W, justifyContent: 'center', paddingRight: space.md, paddingVertical: space.sm },
  partLabel: { ...type.body, fontFamily: 'Nunito_700Bold', color: colors.ink },
  partDetail: { ...type.small, color: colors.inkSoft },
});
