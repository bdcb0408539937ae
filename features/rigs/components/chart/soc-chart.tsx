import { ActivityIndicator, View } from 'react-native';

import type { SocChartProps } from '@/components/charts/chart-types';
import { useCharts } from '@/components/charts/lazy-charts';
import { colors } from '@/shared/theme';

export function SocChart(props: SocChartProps) {
  const charts = useCharts();
  return (
    <View style={{ height: 240 }} testID="soc-chart">
      {charts ? <charts.SocChart {...props} /> : <ActivityIndicator color={colors.night} />}
    </View>
  );
}
