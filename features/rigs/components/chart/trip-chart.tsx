import { useId } from 'react';
import { ActivityIndicator, View } from 'react-native';

import type { TripChartProps } from '@/components/charts/chart-types';
import { describeTripSoc } from '@/components/charts/describe';
import { useCharts } from '@/components/charts/lazy-charts';
import { Small } from '@/components/ui';
import { colors } from '@/shared/theme';

/** A trip's charge through its legs, in a box of fixed height (nothing moves when the chart arrives), with the reading in words. */
export function TripChart(props: TripChartProps) {
  const charts = useCharts();
  const id = useId();
  const days = props.series.length ? Math.round(props.series[props.series.length - 1].hour / 24) : 0;
  return (
    <>
      <View style={{ height: 220 }} testID="trip-chart" role="img" aria-label={`State of charge through the trip, ${days} days`} aria-describedby={`${id}-words`}>
        {charts ? <charts.TripChart {...props} /> : <ActivityIndicator color={colors.night} />}
      </View>
      <Small testID="trip-chart-words" nativeID={`${id}-words`}>
        {describeTripSoc(
          props.series,
          props.stays.map((s) => s.name),
          props.cutoffSocPercent,
        )}
      </Small>
    </>
  );
}
