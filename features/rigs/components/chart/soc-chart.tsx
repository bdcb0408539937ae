import { View } from 'react-native';

import SocChartImpl from './soc-chart-impl';
import type { SocChartProps } from './soc-chart-types';

/** On a device Skia is ready at once. */
export function SocChart(props: SocChartProps) {
  return (
    <View style={{ height: 240 }} testID="soc-chart">
      <SocChartImpl {...props} />
    </View>
  );
}
