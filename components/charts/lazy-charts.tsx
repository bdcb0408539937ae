import charts, { type Charts } from './charts-impl';

/** On a device Skia is ready at once. */
export function useCharts(): Charts | null {
  return charts;
}
