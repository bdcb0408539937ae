// Every SVG drawing, in one module loaded after the first screen (see lazy-drawings.web.tsx): the web build
// has one lazy chunk with react-native-svg's code and the sign-in screen carries none of it. Nothing else may
// import react-native-svg.
import Svg, { Circle, G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { colors } from '@/shared/theme';
import { CIRCUIT_DRAWING_HEIGHT, type CircuitDrawingProps, HOOKUP_SYMBOL_WIDTH, type HookupSymbolProps } from './drawing-types';

/**
 * A wired circuit in Keyoff's drawing style: the battery, its fuse at the battery, the cable with its size
 * and drop written on it, and the device; the return beneath (dashed through the chassis). Scales to its width.
 */
function CircuitSvg({ size, lengthM, dropPercent, allowedDropPercent, fuseA, device, returnPath }: CircuitDrawingProps) {
  const over = allowedDropPercent !== undefined && dropPercent > allowedDropPercent;
  const ink = colors.night;
  return (
    <Svg width="100%" height={CIRCUIT_DRAWING_HEIGHT} viewBox="0 0 360 150" preserveAspectRatio="xMidYMid meet">
      <Rect x={8} y={44} width={56} height={44} rx={6} fill="#FFF4DC" stroke={ink} strokeWidth={2} />
      <SvgText fontFamily="Nunito_700Bold" x={36} y={72} fontSize={13} fontWeight="bold" fill={ink} textAnchor="middle">BATT</SvgText>
      <SvgText fontFamily="Nunito_700Bold" x={58} y={40} fontSize={14} fontWeight="bold" fill={ink} textAnchor="middle">+</SvgText>
      <SvgText fontFamily="Nunito_700Bold" x={14} y={40} fontSize={14} fontWeight="bold" fill={colors.inkSoft} textAnchor="middle">−</SvgText>
      <Line x1={64} x2={84} y1={56} y2={56} stroke={ink} strokeWidth={3} />
      <Rect x={84} y={48} width={34} height={16} rx={3} fill={colors.card} stroke={ink} strokeWidth={2} />
      <Line x1={84} x2={118} y1={56} y2={56} stroke={ink} strokeWidth={1.5} />
      <SvgText fontFamily="Nunito_700Bold" x={101} y={38} fontSize={12} fontWeight="bold" fill={ink} textAnchor="middle">{`${fuseA} A`}</SvgText>
      <Line x1={118} x2={280} y1={56} y2={56} stroke={ink} strokeWidth={6} strokeLinecap="round" />
      <SvgText fontFamily="Nunito_700Bold" x={199} y={44} fontSize={13} fontWeight="bold" fill={ink} textAnchor="middle">{`${size} · ${lengthM} m`}</SvgText>
      <SvgText fontFamily="Nunito_700Bold" x={199} y={78} fontSize={12} fill={over ? colors.short : colors.inkSoft} textAnchor="middle">
        {`drop ${dropPercent.toFixed(2)} %${allowedDropPercent !== undefined ? ` of ${allowedDropPercent} %` : ''}`}
      </SvgText>
      <Rect x={280} y={36} width={72} height={62} rx={8} fill={ink} />
      <Circle cx={316} cy={60} r={9} fill="none" stroke={colors.lamp} strokeWidth={3} />
      <Path d="M316 51 v9" stroke={colors.lamp} strokeWidth={3} />
      <SvgText fontFamily="Nunito_700Bold" x={316} y={88} fontSize={11} fill={colors.paper} textAnchor="middle">{device.length > 11 ? `${device.slice(0, 10)}…` : device}</SvgText>
      <Path d={`M14 88 V118 H300 V98`} fill="none" stroke={colors.inkSoft} strokeWidth={returnPath === 'chassis' ? 2 : 4} strokeDasharray={returnPath === 'chassis' ? '6 5' : undefined} />
      <SvgText fontFamily="Nunito_700Bold" x={160} y={136} fontSize={11} fill={colors.inkSoft} textAnchor="middle">
        {returnPath === 'chassis' ? 'return through the chassis' : `return: ${size}`}
      </SvgText>
    </Svg>
  );
}

// Keyoff's hook-up drawing: the positive feed runs down a rail from the battery to the inverter, the
// return runs beside it on the left; each part sits on its rail (features/rigs/components/hookup/schematic.tsx
// lays out the rows and their labels).
const POS = 52;
const RET = 16;
const MID = 36;
const FULL = '100%';
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

function Symbol({ part, chassis }: HookupSymbolProps) {
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

/** One part of the hook-up drawing, as tall as the row it is put in. */
function HookupSymbol(props: HookupSymbolProps) {
  return (
    <Svg width={HOOKUP_SYMBOL_WIDTH} height={FULL}>
      <Symbol {...props} />
    </Svg>
  );
}

const drawings = { CircuitSvg, HookupSymbol };
export type Drawings = typeof drawings;
export default drawings;
