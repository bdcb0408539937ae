import { View } from 'react-native';

import type { ReadingsChartPoint } from '@/components/charts/chart-types';
import { dateTimeLabel } from '@/components/charts/date-axis';
import { Card, Heading, Small } from '@/components/ui';
import { space } from '@/shared/theme';
import type { Readings } from '../api/readings';
import { ReadingsChart } from './chart/readings-chart';

/** The view's points (already averaged by the server) and the model's, merged on one time axis. */
export function chartPoints(r: Readings): ReadingsChartPoint[] {
  const measured = r.chart.points.map((p) => ({ t: Date.parse(p.at), soc: p.socPercent, model: null, voltage: p.voltageV }));
  const model = r.chart.model.map((p) => ({ t: Date.parse(p.at), soc: null, model: p.socPercent, voltage: null }));
  return [...measured, ...model].sort((a, b) => a.t - b.t);
}

export function ChartCard({ readings }: { readings: Readings }) {
  const points = chartPoints(readings);
  const hasSoc = readings.chart.points.some((p) => p.socPercent !== null) || readings.chart.model.length > 0;
  const first = readings.chart.points[0];
  const last = readings.chart.points[readings.chart.points.length - 1];
  return (
    <Card testID="readings-chart-card">
      <Heading>{hasSoc ? 'State of charge and voltage: measured and modelled' : 'Battery voltage'}</Heading>
      {readings.chart.points.length >= 2 ? (
        <View style={{ gap: space.sm }}>
          <ReadingsChart points={points} showSoc={hasSoc} showVoltage />
          <Small testID="chart-range">
            {dateTimeLabel(first.at)} to {dateTimeLabel(last.at)} ({readings.timeZone}): {readings.total.toLocaleString()} readings
            {readings.chart.points.length < readings.total ? `, averaged into ${readings.chart.points.length} points` : ''}
            {readings.window?.clipped ? `; the chart shows the last ${readings.window.days} days of the record` : ''}.
          </Small>
          <Small>
            {hasSoc
              ? 'Dark: the state of charge from the readings (a monitor’s, or a rested voltage). Grey: the model, parked, from the first known state of charge, hour by hour of its schedule. Blue: the battery voltage.'
              : 'The state of charge cannot be told from these readings (mark rested ones, or log a monitor’s state of charge); the voltage is shown.'}
          </Small>
        </View>
      ) : (
        <Small>Add two readings or upload a log to see them charted against the model.</Small>
      )}
    </Card>
  );
}
