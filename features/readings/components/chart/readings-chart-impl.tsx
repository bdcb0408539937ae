// Loaded only after CanvasKit (see readings-chart.web.tsx): nothing here may be imported before Skia is ready.
import { useFont } from '@shopify/react-native-skia';
import { CartesianChart, Line, Scatter } from 'victory-native';

import { colors } from '@/shared/theme';
import type { ReadingsChartProps } from './readings-chart-types';

const font = require('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf');

export default function ReadingsChartImpl({ points, unit }: ReadingsChartProps) {
  const axisFont = useFont(font, 12);
  const data = points.map((p) => ({ h: p.h, measured: p.measured, model: p.model ?? undefined }));
  const values = points.map((p) => p.measured);
  const domain = unit === '%' ? ([0, 100] as [number, number]) : ([Math.floor(Math.min(...values) * 10) / 10 - 0.1, Math.ceil(Math.max(...values) * 10) / 10 + 0.1] as [number, number]);
  const span = points.length ? points[points.length - 1].h : 0;
  return (
    <CartesianChart
      data={data}
      xKey="h"
      yKeys={['measured', 'model']}
      domain={{ y: domain }}
      padding={{ left: 4, right: 8, top: 8, bottom: 4 }}
      xAxis={{ font: axisFont, tickCount: 6, formatXLabel: (h) => (span > 72 ? `${Math.round(Number(h) / 24)} d` : `${Math.round(Number(h))} h`), labelColor: colors.inkSoft, lineColor: colors.line }}
      yAxis={[{ font: axisFont, tickCount: 5, formatYLabel: (v) => (unit === '%' ? `${Math.round(Number(v))} %` : `${Number(v).toFixed(2)} V`), labelColor: colors.inkSoft, lineColor: colors.line }]}
    >
      {({ points: p }) => (
        <>
          {unit === '%' ? <Line points={p.model} color={colors.inkSoft} strokeWidth={1.5} connectMissingData /> : null}
          <Line points={p.measured} color={colors.night} strokeWidth={2} />
          {points.length <= 60 ? <Scatter points={p.measured} radius={3} color={colors.lampDeep} /> : null}
        </>
      )}
    </CartesianChart>
  );
}
