import { View } from 'react-native';

import { CIRCUIT_DRAWING_HEIGHT, type CircuitDrawingProps } from './drawing-types';
import { useDrawings } from './lazy-drawings';

export type { CircuitDrawingProps } from './drawing-types';

/**
 * A wired circuit drawn (components/wiring/drawings-impl.tsx), described in words for screen readers. Its
 * height is kept while the drawing loads, so nothing moves when it arrives.
 */
export function CircuitDrawing(props: CircuitDrawingProps) {
  const drawings = useDrawings();
  const { size, lengthM, dropPercent, fuseA, device, testID } = props;
  return (
    <View testID={testID} role="img" aria-label={`Battery, ${fuseA} A fuse at the battery, ${size} over ${lengthM} m dropping ${dropPercent.toFixed(2)} %, to ${device}`}>
      {drawings ? <drawings.CircuitSvg {...props} /> : <View style={{ height: CIRCUIT_DRAWING_HEIGHT }} />}
    </View>
  );
}
