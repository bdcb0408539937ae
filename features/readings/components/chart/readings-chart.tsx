import { View } from 'react-native';

import ReadingsChartImpl from './readings-chart-impl';
import type { ReadingsChartProps } from './readings-chart-types';

/** On a device Skia is ready at once. */
export function ReadingsChart(props: ReadingsChartProps) {
  return (
    <View style={{ height: 240 }} testID="readings-chart">
      <ReadingsChartImpl {...props} />
    </View>
  );
}
