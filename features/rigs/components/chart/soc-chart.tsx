import { useId } from 'react';
import { ActivityIndicator, View } from 'react-native';

import type { SocChartProps } from '@/components/charts/chart-types';
import { describeSoc } from '@/components/charts/describe';
import { useCharts } from '@/components/charts/lazy-charts';
import { Small } from '@/components/ui';
import { colors } from '@/shared/theme';

/** The charge chart with its text alternative: the same reading in words, under it and tied to it. */
export function SocChart(props: SocChartProps) {
  const charts = useCharts();
  const id = useId();
  const days = props.series.length ? Math.round(props.series[props.series.length - 1].hour / 24) : 0;
  return (
    <>
      <View style={{ height: 240 }} testID="soc-chart" role="img" aria-label={`State of charge over ${days} days`} aria-describedby={`${id}-words`}>
        {charts ? <charts.SocChart {...props} /> : <ActivityIndicator color={colors.night} />}
      </View>
      <Small testID="soc-chart-words" nativeID={`${id}-words`}>
        {describeSoc(props.series, props.cutoffSocPercent)}
      </Small>
    </>
  );
}
