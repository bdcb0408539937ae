import { View } from 'react-native';
import Svg, { Circle, Line, Path, Rect, Text as SvgText } from 'react-native-svg';

import { colors } from '@/shared/theme';

export type CircuitDrawingProps = {
  size: string;
  lengthM: number;
  dropPercent: number;
  allowedDropPercent?: number;
  fuseA: number;
  device: string;
  returnPath: 'cable' | 'chassis';
  testID?: string;
};

/**
 * A wired circuit in Keyoff's drawing style: the battery, its fuse at the battery, the cable with its size
 * and drop written on it, and the device; the return beneath (dashed through the chassis). Scales to its width.
 */
export function CircuitDrawing({ size, lengthM, dropPercent, allowedDropPercent, fuseA, device, returnPath, testID }: CircuitDrawingProps) {
  const over = allowedDropPercent !== undefined && dropPercent > allowedDropPercent;
  const ink = colors.night;
  return (
    <View testID={testID} role="img" aria-label={`Battery, ${fuseA} A fuse at the battery, ${size} over ${lengthM} m dropping ${dropPercent.toFixed(2)} %, to ${device}`}>
      <Svg width="100%" height={150} viewBox="0 0 360 150" preserveAspectRatio="xMidYMid meet">
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
    </View>
  );
}
