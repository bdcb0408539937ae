import { type ComponentType, useEffect, useState } from 'react';
import { ActivityIndicator, View } from 'react-native';

import { colors } from '@/shared/theme';
import type { ReadingsChartProps } from './readings-chart-types';

/** As the Outlook's chart: CanvasKit from our own origin first, then the chart's code as a lazy chunk. */
export function ReadingsChart(props: ReadingsChartProps) {
  const [Chart, setChart] = useState<ComponentType<ReadingsChartProps> | null>(null);
  useEffect(() => {
    let live = true;
    (async () => {
      const { LoadSkiaWeb } = await import('@shopify/react-native-skia/lib/module/web');
      await LoadSkiaWeb({ locateFile: (file: string) => `/${file}` });
      const mod = await import('./readings-chart-impl');
      if (live) setChart(() => mod.default);
    })();
    return () => {
      live = false;
    };
  }, []);
  return (
    <View style={{ height: 240 }} testID="readings-chart">
      {Chart ? <Chart {...props} /> : <ActivityIndicator color={colors.night} />}
    </View>
  );
}
