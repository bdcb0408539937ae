import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import type { HookupPart } from '@/shared/energy/hookup/plan';
import { colors, radius, space, type } from '@/shared/theme';
import type { RigHookup } from '../../api/hookup';

// Keyoff's hook-up drawing: the positive feed runs down a rail from the battery to the inverter, the
// return runs beside it on the left; each part sits on its rail with its label and rating to the right.
// One row per part, so labels wrap on a phone and the rails stay joined whatever the row's height.
const POS = 52;
const RET = 16;
const MID = 36;
const W = 92;
const FULL = '100%';

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
  const chassis = plan.feed.returnPath === 'chassis';
  return (
    <View testID={testID} role="img" aria-label={`Hook-up drawing: ${plan.parts.map((p) => p.label).join(', ')}`} style={styles.frame}>
      {rowsOf(plan).map(({ part, detail }, i) => (
        <View key={`${part.kind}-${i}`} style={styles.row} testID={`hookup-part-${part.kind}`}>
          <View style={styles.symbol}>
            <Svg width={W} height={FULL}>
              <Symbol part={part} chassis={chassis} />
            </Svg>
          </View>
          <View style={styles.label}>
            <Text style={styles.partLabel}>{part.label}</Text>
            {detail ? <Text style={styles.partDetail}>{detail}</Text> : null}
          </View>
        </View>
      ))}
    </View>
  );
}

const stroke = colors.night;
const retStroke = colors.inkSoft;

function Rails({ posFrom = 0, posTo = FULL, posGap, retFrom = 0, retTo = FULL, chassis, heavy }: {
  posFrom?: number;
  posTo?: number | string;
  posGap?: [number, number];
  retFrom?: number;
  retTo?: number | string;
  chassis: boolean;
  heavy?: boolean;
}) {
  const w = heavy ? 6 : 3;
  return (
    <G>
      {posGap ? (
        <>
          <Line x1={POS} x2={POS} y1={posFrom} y2={posGap[0]} stroke={stroke} strokeWidth={w} />
          <Line x1={POS} x2={POS} y1={posGap[1]} y2={posTo} stroke={stroke} strokeWidth={w} />
        </>
      ) : (
        <Line x1={POS} x2={POS} y1={posFrom} y2={posTo} stroke={stroke} strokeWidth={w} />
      )}
      <Line x1={RET} x2={RET} y1={retFrom} y2={retTo} stroke={retStroke} strokeWidth={chassis ? 2 : w} strokeDasharray={chassis ? '5 4' : undefined} />
    </G>
  );
}

function Symbol({ part, chassis }: { part: HookupPart; chassis: boolean }) {
  switch (part.kind) {
    case 'battery':
      return (
        <G>
          <Rails posFrom={48} retFrom={48} chassis={chassis} />
          <Rect x={6} y={14} width={62} height={34} rx={6} fill="#FFF4DC" stroke={stroke} strokeWidth={2} />
          <Rect x={46} y={8} width={12} height={6} fill={stroke} />
          <Rect x={10} y={8} width={12} height={6} fill={retStroke} />
          <SvgText fontFamily="Nunito_700Bold" x={52} y={38} fontSize={16} fontWeight="bold" fill={stroke} textAnchor="middle">+</SvgText>
          <SvgText fontFamily="Nunito_700Bold" x={16} y={38} fontSize={16} fontWeight="bold" fill={retStroke} textAnchor="middle">−</SvgText>
        </G>
      );
    case 'protection':
    case 'switching-breaker':
      return (
        <G>
          <Rails posGap={[20, 52]} chassis={chassis} />
          <Rect x={POS - 8} y={20} width={16} height={32} rx={3} fill={part.kind === 'switching-breaker' ? colors.lamp : colors.card} stroke={stroke} strokeWidth={2} />
          <Line x1={POS} x2={POS} y1={20} y2={52} stroke={stroke} strokeWidth={1.5} />
          {part.kind === 'switching-breaker' ? (
            <G>
              <Line x1={POS + 8} x2={POS + 22} y1={30} y2={20} stroke={stroke} strokeWidth={3} strokeLinecap="round" />
              <Circle cx={POS + 22} cy={20} r={3} fill={stroke} />
            </G>
          ) : null}
        </G>
      );
    case 'switch':
    case 'relay':
      return (
        <G>
          <Rails posGap={[22, 52]} chassis={chassis} />
          <Circle cx={POS} cy={22} r={3.5} fill={colors.card} stroke={stroke} strokeWidth={2} />
          <Circle cx={POS} cy={52} r={3.5} fill={colors.card} stroke={stroke} strokeWidth={2} />
          <Line x1={POS} x2={POS + 14} y1={52} y2={26} stroke={colors.lampDeep} strokeWidth={3} strokeLinecap="round" />
          {part.kind === 'relay' ? (
            <G>
              <Rect x={74} y={28} width={14} height={18} fill={colors.card} stroke={stroke} strokeWidth={2} />
              <Line x1={74} x2={POS + 8} y1={37} y2={37} stroke={stroke} strokeWidth={1.5} strokeDasharray="3 3" />
              <Line x1={81} x2={81} y1={0} y2={28} stroke={stroke} strokeWidth={1.5} strokeDasharray="3 3" />
            </G>
          ) : null}
        </G>
      );
    case 'coil-fuse':
      return (
        <G>
          <Rails chassis={chassis} />
          <Rect x={72} y={30} width={18} height={10} rx={2} fill={colors.card} stroke={stroke} strokeWidth={1.5} />
          <Line x1={72} x2={90} y1={35} y2={35} stroke={stroke} strokeWidth={1} />
          <Line x1={81} x2={81} y1={40} y2={FULL} stroke={stroke} strokeWidth={1.5} strokeDasharray="3 3" />
          <Line x1={81} x2={81} y1={12} y2={30} stroke={stroke} strokeWidth={1.5} />
          <SvgText fontFamily="Nunito_700Bold" x={81} y={10} fontSize={9} fill={stroke} textAnchor="middle">ACC</SvgText>
        </G>
      );
    case 'remote-switch':
      return (
        <G>
          <Rails chassis={chassis} />
          <Rect x={70} y={22} width={18} height={18} fill={colors.card} stroke={stroke} strokeWidth={2} />
          <SvgText fontFamily="Nunito_700Bold" x={79} y={35} fontSize={10} fontWeight="bold" fill={stroke} textAnchor="middle">R</SvgText>
          <Line x1={79} x2={79} y1={0} y2={22} stroke={stroke} strokeWidth={1.5} strokeDasharray="3 3" />
          <Line x1={79} x2={79} y1={40} y2={FULL} stroke={stroke} strokeWidth={1.5} strokeDasharray="3 3" />
        </G>
      );
    case 'low-voltage-disconnect':
      return (
        <G>
          <Rails posGap={[18, 54]} chassis={chassis} />
          <Rect x={POS - 16} y={18} width={32} height={36} rx={5} fill={colors.lamp} stroke={stroke} strokeWidth={2} />
          <SvgText fontFamily="Nunito_700Bold" x={POS} y={40} fontSize={10} fontWeight="bold" fill={stroke} textAnchor="middle">LVD</SvgText>
        </G>
      );
    case 'socket':
      return (
        <G>
          <Rails posGap={[MID - 13, MID + 13]} chassis={chassis} />
          <Circle cx={POS} cy={MID} r={13} fill={colors.card} stroke={stroke} strokeWidth={2} />
          <Circle cx={POS} cy={MID} r={4} fill={stroke} />
          <Line x1={RET} x2={POS - 13} y1={MID} y2={MID} stroke={retStroke} strokeWidth={2} />
        </G>
      );
    case 'conductor':
      return <Rails heavy chassis={chassis} />;
    case 'return':
      return (
        <G>
          <Rails heavy={!chassis} chassis={chassis} />
          {chassis ? (
            <G>
              <Line x1={RET - 10} x2={RET + 10} y1={MID} y2={MID} stroke={retStroke} strokeWidth={2.5} />
              <Line x1={RET - 6} x2={RET + 6} y1={MID + 5} y2={MID + 5} stroke={retStroke} strokeWidth={2.5} />
              <Line x1={RET - 2} x2={RET + 2} y1={MID + 10} y2={MID + 10} stroke={retStroke} strokeWidth={2.5} />
            </G>
          ) : null}
        </G>
      );
    case 'inverter':
      return (
        <G>
          <Rails posTo={14} retTo={14} chassis={chassis} />
          <Rect x={6} y={14} width={80} height={44} rx={8} fill={stroke} />
          <Path d="M24 36 q8 -14 16 0 t16 0 t16 0" stroke={colors.lamp} strokeWidth={3} fill="none" />
        </G>
      );
  }
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
