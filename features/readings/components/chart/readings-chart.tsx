import { ActivityIndicator, View } from 'react-native';

import type { ReadingsChartProps } from '@/components/charts/chart-types';
import { useCharts } from '@/components/charts/lazy-charts';
import { colors } from '@/shared/theme';

export function ReadingsChart(props: ReadingsChartProps) {
  const charts = useCharts();
  return (
    <View style={{ height: 240 }} testID="readings-chart">
      {charts ? <charts.ReadingsChart {...props} /> : <ActivityIndicator color={colors.night} />}
    </View>
  );
}
