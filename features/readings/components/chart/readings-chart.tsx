import { ActivityIndicator, View } from 'react-native';

import type { ReadingsChartProps } from '@/components/charts/chart-types';
import { useCharts } from '@/components/charts/lazy-charts';
import { colors } from '@/shared/theme';

export function ReadingsChart(props: ReadingsChartProps) {
  const charts = useCharts();
  const both = props.showSoc && props.showVoltage;
  return (
    <View style={{ height: both ? 400 : 220 }} testID="readings-chart">
      {charts ? <charts.ReadingsChart {...props} /> : <ActivityIndicator color={colors.night} />}
    </View>
  );
}
