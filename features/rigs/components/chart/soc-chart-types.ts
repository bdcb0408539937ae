import type { Projection } from '@/shared/energy/project';

export type SocChartProps = { series: Projection['series']; cutoffSocPercent: number };
