// Every chart, in one module loaded only after CanvasKit (see lazy-charts.web.tsx): nothing here may be
// imported before Skia is ready. One module, so the web build has one lazy chunk with Skia's code and the
// first screen carries none of it.
import { Line as SkiaLine, Rect, useFont, vec } from '@shopify/react-native-skia';
import { View } from 'react-native';
import { CartesianChart, Line, Scatter } from 'victory-native';

import { colors } from '@/shared/theme';
import type { ReadingsChartProps, SocChartProps } from './chart-types';
import { dateLabel, midnightTicks } from './date-axis';

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

function ReadingsChartImpl({ points, showSoc, showVoltage }: ReadingsChartProps) {
  const axisFont = useFont(font, 12);
  const span = points.length ? points[points.length - 1].t - points[0].t : 0;
  const x: [number, number] = points.length ? [points[0].t, points[points.length - 1].t] : [0, 1];
  // With tick values victory-native would take the x domain from them: the record's own span is given.
  const tickValues = points.length ? midnightTicks(x[0], x[1]) : undefined;
  const xAxis = { font: axisFont, tickCount: 4, ...(tickValues ? { tickValues } : {}), formatXLabel: dateLabel(span), labelColor: colors.inkSoft, lineColor: colors.line };
  const volts = points.flatMap((p) => (p.voltage === null ? [] : [p.voltage]));
  const vDomain: [number, number] = volts.length ? [Math.floor(Math.min(...volts) * 10) / 10 - 0.1, Math.ceil(Math.max(...volts) * 10) / 10 + 0.1] : [11, 14];
  const data = points.map((p) => ({ t: p.t, soc: p.soc ?? undefined, model: p.model ?? undefined, voltage: p.voltage ?? undefined }));
  const few = points.length <= 60;
  return (
    <View style={{ flex: 1, gap: 8 }}>
      {showSoc ? (
        <View style={{ flex: 1 }} testID="readings-chart-soc">
          <CartesianChart data={data} xKey="t" yKeys={['soc', 'model']} domain={{ x, y: [0, 100] }} padding={{ left: 4, right: 8, top: 8, bottom: 4 }} xAxis={xAxis} yAxis={[{ font: axisFont, tickValues: [0, 25, 50, 75, 100], formatYLabel: (v) => `${Math.round(Number(v))} %`, labelColor: colors.inkSoft, lineColor: colors.line }]}>
            {({ points: p }) => (
              <>
                <Line points={p.model} color={colors.inkSoft} strokeWidth={1.5} connectMissingData />
                <Line points={p.soc} color={colors.night} strokeWidth={2} connectMissingData />
                {few ? <Scatter points={p.soc} radius={3} color={colors.lampDeep} /> : null}
              </>
            )}
          </CartesianChart>
        </View>
      ) : null}
      {showVoltage ? (
        <View style={{ flex: 1 }} testID="readings-chart-voltage">
          <CartesianChart data={data} xKey="t" yKeys={['voltage']} domain={{ x, y: vDomain }} padding={{ left: 4, right: 8, top: 8, bottom: 4 }} xAxis={xAxis} yAxis={[{ font: axisFont, tickCount: 4, formatYLabel: (v) => `${Number(v).toFixed(2)} V`, labelColor: colors.inkSoft, lineColor: colors.line }]}>
            {({ points: p }) => (
              <>
                <Line points={p.voltage} color={colors.focus} strokeWidth={1.5} connectMissingData />
                {few ? <Scatter points={p.voltage} radius={3} color={colors.focus} /> : null}
              </>
            )}
          </CartesianChart>
        </View>
      ) : null}
    </View>
  );
}

const charts = { SocChart: SocChartImpl, ReadingsChart: ReadingsChartImpl };
export type Charts = typeof charts;
export default charts;
