import { type ComponentType, useEffect, useState } from 'react';
import { ActivityIndicator, View } from 'react-native';

import { colors } from '@/shared/theme';
import type { SocChartProps } from './soc-chart-types';

/**
 * On the web Skia builds its API from CanvasKit when first imported, so CanvasKit (served from our own
 * origin) loads first and the chart's code follows as a lazy chunk. Screens without a chart never load either.
 */
export function SocChart(props: SocChartProps) {
  const [Chart, setChart] = useState<ComponentType<SocChartProps> | null>(null);
  useEffect(() => {
    let live = true;
    (async () => {
      const { LoadSkiaWeb } = await import('@shopify/react-native-skia/lib/module/web');
      await LoadSkiaWeb({ locateFile: (file: string) => `/${file}` });
      const mod = await import('./soc-chart-impl');
      if (live) setChart(() => mod.default);
    })();
    return () => {
      live = false;
    };
  }, []);
  return (
    <View style={{ height: 240 }} testID="soc-chart">
      {Chart ? <Chart {...props} /> : <ActivityIndicator color={colors.night} />}
    </View>
  );
}
