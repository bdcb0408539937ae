// Every chart, in one module loaded only after CanvasKit (see lazy-charts.web.tsx): nothing here may be
// imported before Skia is ready. One module, so the web build has one lazy chunk with Skia's code and the
// first screen carries none of it.
import { Line as SkiaLine, Rect, useFont, vec } from '@shopify/react-native-skia';
import { CartesianChart, Line, Scatter } from 'victory-native';

import { colors } from '@/shared/theme';
import type { ReadingsChartProps, SocChartProps } from './chart-types';

const font = require('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf');

function SocChartImpl({ series, cutoffSocPercent, startSocPercent }: SocChartProps) {
  const axisFont = useFont(font, 12);
  const first = startSocPercent ?? series[0]?.socPercent ?? 100;
  const data = [{ hour: 0, soc: first, parked: startSocPercent ?? series[0]?.parkedSocPercent ?? 100, driving: 0 }, ...series.map((s) => ({ hour: s.hour, soc: s.socPercent, parked: s.parkedSocPercent, driving: s.drivingMinutes }))];
  return (
    <CartesianChart
      data={data}
      xKey="hour"
      yKeys={['soc', 'parked']}
      domain={{ y: [0, 100] }}
      padding={{ left: 4, right: 8, top: 8, bottom: 4 }}
      xAxis={{ font: axisFont, tickCount: 7, formatXLabel: (h) => `${Math.round(Number(h) / 24)} d`, labelColor: colors.inkSoft, lineColor: colors.line }}
      yAxis={[{ font: axisFont, tickValues: [0, 25, 50, 75, 100], formatYLabel: (v) => `${v} %`, labelColor: colors.inkSoft, lineColor: colors.line }]}
    >
      {({ points, chartBounds, xScale, yScale }) => {
        const step = points.soc.length > 1 ? (points.soc[1].x - points.soc[0].x) : 1;
        const y = yScale(cutoffSocPercent);
        return (
          <>
            {data.map((d, i) =>
              d.driving > 0 ? (
                <Rect key={i} x={xScale(d.hour - 1)} y={chartBounds.top} width={Math.max(1, step * (d.driving / 60))} height={chartBounds.bottom - chartBounds.top} color="rgba(244, 185, 66, 0.35)" />
              ) : null,
            )}
            <SkiaLine p1={vec(chartBounds.left, y)} p2={vec(chartBounds.right, y)} color={colors.short} strokeWidth={1.5} />
            <Line points={points.parked} color={colors.inkSoft} strokeWidth={1.5} />
            <Line points={points.soc} color={colors.night} strokeWidth={2.5} />
          </>
        );
      }}
    </CartesianChart>
  );
}

function ReadingsChartImpl({ points, unit }: ReadingsChartProps) {
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

const charts = { SocChart: SocChartImpl, ReadingsChart: ReadingsChartImpl };
export type Charts = typeof charts;
export default charts;
