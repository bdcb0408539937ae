import type { Projection } from '@/shared/energy/project';
import type { TripOutlook } from '@/shared/energy/trip';

/** startSocPercent: the first point, the charge the projection starts from. */
export type SocChartProps = { series: Projection['series']; cutoffSocPercent: number; startSocPercent?: number };
/** A moment of the record (ms since 1970): the readings' state of charge where known, the model's, and the voltage. */
export type ReadingsChartPoint = { t: number; soc: number | null; model: number | null; voltage: number | null };
/** Two charts over the same dates: state of charge (measured and modelled) above, voltage below. */
export type ReadingsChartProps = { points: ReadingsChartPoint[]; showSoc: boolean; showVoltage: boolean };
/** A trip's state of charge hour by hour (`stay`: the index into `stays`), its stays' names and its drives. */
export type TripChartProps = {
  series: TripOutlook['series'];
  stays: Pick<TripOutlook['stays'][number], 'name' | 'arriveAt' | 'socOnArrivalPercent'>[];
  drives: TripOutlook['drives'];
  cutoffSocPercent: number;
};
