import type { Projection } from '@/shared/energy/project';

/** startSocPercent: the first point, the charge the projection starts from. */
export type SocChartProps = { series: Projection['series']; cutoffSocPercent: number; startSocPercent?: number };
/** Hours since the first reading; `measured` from the readings, `model` the projection over the same hours. */
export type ReadingsChartPoint = { h: number; measured: number; model: number | null };
export type ReadingsChartProps = { points: ReadingsChartPoint[]; unit: '%' | 'V' };
