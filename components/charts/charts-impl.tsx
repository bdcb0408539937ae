// Every chart, in one module loaded only after CanvasKit (see lazy-charts.web.tsx): nothing here may be
// imported before Skia is ready. One module, so the web build has one lazy chunk with Skia's code and the
// first screen carries none of it.
import { DashPathEffect, Group, Line as SkiaLine, Rect, Text as SkiaText, useFont, vec } from '@shopify/react-native-skia';
import { useState } from 'react';
import { View } from 'react-native';
import { CartesianChart, Line, Scatter } from 'victory-native';

import { colors } from '@/shared/theme';
import type { ReadingsChartProps, SocChartProps, TripChartProps } from './chart-types';
import { dateLabel, midnightTicks } from './date-axis';
import { dayTicks, drivingBands, stopWhenFlat, tripDayTicks, tripHourAt } from './describe';

const font = require('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf');

function SocChartImpl({ series, cutoffSocPercent, startSocPercent }: SocChartProps) {
  const axisFont = useFont(font, 12);
  const [width, setWidth] = useState(0);
  const hours = series.length ? series[series.length - 1].hour : 24;
  const days = hours / 24;
  // Regular day ticks at midnight with the weekday's name: every day when there is room, else every 2nd or 7th.
  const every = [1, 2, 7].find((k) => width === 0 || width / (days / k) >= 44) ?? 7;
  const ticks = dayTicks(series, every);
  const first = startSocPercent ?? series[0]?.socPercent ?? 100;
  const soc = stopWhenFlat([first, ...series.map((s) => s.socPercent)]);
  const parked = stopWhenFlat([startSocPercent ?? series[0]?.parkedSocPercent ?? 100, ...series.map((s) => s.parkedSocPercent)]);
  const data = [{ hour: 0 }, ...series.map((s) => ({ hour: s.hour }))].map((d, i) => ({ ...d, soc: soc[i], parked: parked[i] }));
  // A drive of 40 minutes in 14 days is under a pixel wide at scale: each band is at least 8 px.
  const minBandHours = width > 0 ? (8 / width) * hours : 1;
  const bands = drivingBands(series, minBandHours);
  return (
    <View style={{ flex: 1 }} onLayout={(e) => setWidth(e.nativeEvent.layout.width)}>
      <CartesianChart
        data={data}
        xKey="hour"
        yKeys={['soc', 'parked']}
        domain={{ x: [0, hours], y: [0, 100] }}
        // A little room below 0 % and above 100 %, so both labels show clear of the edges.
        domainPadding={{ top: 8, bottom: 8 }}
        padding={{ left: 4, right: 12, top: 12, bottom: 4 }}
        // tickCount as many as the ticks: victory-native thins tickValues down to tickCount otherwise.
        xAxis={{ font: axisFont, tickValues: ticks.map((t) => t.hour), tickCount: Math.max(1, ticks.length), formatXLabel: (h) => ticks.find((t) => t.hour === Number(h))?.label ?? '', labelColor: colors.inkSoft, lineColor: colors.line }}
        yAxis={[{ font: axisFont, tickValues: [0, 25, 50, 75, 100], tickCount: 5, formatYLabel: (v) => `${v} %`, labelColor: colors.ink, lineColor: colors.line }]}
      >
        {({ points, chartBounds, xScale, yScale }) => {
          const y = yScale(cutoffSocPercent);
          return (
            <>
              {bands.map((b, i) => (
                <Group key={i}>
                  <Rect x={xScale(b.from)} y={chartBounds.top} width={Math.max(1, xScale(b.to) - xScale(b.from))} height={chartBounds.bottom - chartBounds.top} color="rgba(244, 185, 66, 0.45)" />
                  <Rect x={xScale(b.from)} y={chartBounds.top} width={Math.max(1, xScale(b.to) - xScale(b.from))} height={4} color={colors.lampDeep} />
                </Group>
              ))}
              <SkiaLine p1={vec(chartBounds.left, y)} p2={vec(chartBounds.right, y)} color={colors.short} strokeWidth={2} />
              {axisFont ? <SkiaText x={chartBounds.right - 70} y={y - 4} text="cut-off" font={axisFont} color={colors.short} /> : null}
              <Line points={points.parked} color={colors.inkSoft} strokeWidth={2}>
                <DashPathEffect intervals={[7, 5]} />
              </Line>
              <Line points={points.soc} color={colors.night} strokeWidth={3} />
            </>
          );
        }}
      </CartesianChart>
    </View>
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

/** A trip's charge through its legs: the cut-off, each drive as a band, a thin line where each stay begins with its name when there is room. */
function TripChartImpl({ series, stays, drives, cutoffSocPercent }: TripChartProps) {
  const axisFont = useFont(font, 12);
  const [width, setWidth] = useState(0);
  const hours = series.length ? series[series.length - 1].hour : 24;
  const every = [1, 2, 7].find((k) => width === 0 || width / (hours / 24 / k) >= 44) ?? 7;
  const ticks = tripDayTicks(series, every);
  const starts = stays.map((s) => ({ name: s.name, hour: Math.max(0, tripHourAt(series, s.arriveAt) ?? 0) }));
  // The series begins at the end of the first hour: a trip that starts with a stay starts at its charge on arrival.
  const first = starts[0]?.hour === 0 ? [{ hour: 0, soc: stays[0].socOnArrivalPercent }] : [];
  const data = [...first, ...series.map((p) => ({ hour: p.hour, soc: p.socPercent }))];
  const minBandHours = width > 0 ? (8 / width) * hours : 1;
  const bands = drives.flatMap((d) => {
    const from = tripHourAt(series, `${d.date}T${String(d.startHour).padStart(2, '0')}:00`);
    if (from === null) return [];
    const span = Math.max(d.minutes / 60, minBandHours);
    return [{ from: from + d.minutes / 120 - span / 2, to: from + d.minutes / 120 + span / 2 }];
  });
  return (
    <View style={{ flex: 1 }} onLayout={(e) => setWidth(e.nativeEvent.layout.width)}>
      <CartesianChart
        data={data}
        xKey="hour"
        yKeys={['soc']}
        domain={{ x: [0, hours], y: [0, 100] }}
        domainPadding={{ top: 8, bottom: 8 }}
        padding={{ left: 4, right: 12, top: 12, bottom: 4 }}
        xAxis={{ font: axisFont, tickValues: ticks.map((t) => t.hour), tickCount: Math.max(1, ticks.length), formatXLabel: (h) => ticks.find((t) => t.hour === Number(h))?.label ?? '', labelColor: colors.inkSoft, lineColor: colors.line }}
        yAxis={[{ font: axisFont, tickValues: [0, 25, 50, 75, 100], tickCount: 5, formatYLabel: (v) => `${v} %`, labelColor: colors.ink, lineColor: colors.line }]}
      >
        {({ points, chartBounds, xScale, yScale }) => {
          const y = yScale(cutoffSocPercent);
          return (
            <>
              {bands.map((b, i) => (
                <Rect key={i} x={xScale(b.from)} y={chartBounds.top} width={Math.max(1, xScale(b.to) - xScale(b.from))} height={chartBounds.bottom - chartBounds.top} color="rgba(244, 185, 66, 0.45)" />
              ))}
              {starts.map((s, i) => {
                const x = xScale(s.hour);
                const room = (i + 1 < starts.length ? xScale(starts[i + 1].hour) : chartBounds.right) - x;
                return (
                  <Group key={i}>
                    {i > 0 ? <SkiaLine p1={vec(x, chartBounds.top)} p2={vec(x, chartBounds.bottom)} color={colors.inkSoft} strokeWidth={1} /> : null}
                    {axisFont && room >= s.name.length * 7 + 8 ? <SkiaText x={x + 4} y={chartBounds.top + 14} text={s.name} font={axisFont} color={colors.inkSoft} /> : null}
                  </Group>
                );
              })}
              <SkiaLine p1={vec(chartBounds.left, y)} p2={vec(chartBounds.right, y)} color={colors.short} strokeWidth={2} />
              {axisFont ? <SkiaText x={chartBounds.right - 70} y={y - 4} text="cut-off" font={axisFont} color={colors.short} /> : null}
              <Line points={points.soc} color={colors.night} strokeWidth={3} />
            </>
          );
        }}
      </CartesianChart>
    </View>
  );
}

const charts = { SocChart: SocChartImpl, ReadingsChart: ReadingsChartImpl, TripChart: TripChartImpl };
export type Charts = typeof charts;
export default charts;
