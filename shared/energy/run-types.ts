// The shapes of one run of the model (run.ts): its options, its answer and the first week's totals.

/**
 * Per hour: the charge at its end (Ah), and 1 where the inverter was on (else 0). The state of charge,
 * the net change and the minutes driven follow from these and the input (see seriesOf in series.ts).
 */
export type Trace = { ah: number[]; inverterOn: number[] };

export type RunTotals = {
  /** Loads, Peukert's extra included. */
  loadAh: number;
  inverterIdleAh: number;
  keyOffAh: number;
  selfDischargeAh: number;
  /** Put back: what the charging sources supplied to the loads or stored in the battery. */
  chargeAh: number;
  /** What the charging sources offered; the rest of it was not stored (battery full, acceptance, frost, losses). */
  offeredAh: number;
  /** Of the offer, what a self-heating battery's heater used while it warmed. */
  heatingAh: number;
  /** Ah of AC loads that were scheduled but could not run because the inverter was off. */
  acNotServedAh: number;
  perLoadAh: number[];
  hours: number;
};

export type RunResult = {
  hoursToCutoff: number | null;
  hoursToFlat: number | null;
  /** When a low-voltage disconnect first opened, in hours from the start. */
  hoursToLvdOpen: number | null;
  minSoc: number;
  maxAcWatts: number;
  /** Per hour, on request: the charge (Ah) and whether the inverter was on. */
  trace: Trace | null;
  week: RunTotals | null;
  /** The charge at the end, the highest charge, and the disconnect's state at the end (for the next week). */
  endAh: number;
  maxAh: number;
  lvdOn: boolean;
};

export type RunOptions = {
  withDriving: boolean;
  record?: boolean;
  trackWeek?: boolean;
  hours?: number;
  /** Stop as soon as the cut-off is reached (for the Fixes' searches). */
  untilCutoff?: boolean;
  /** With trackWeek: also the amp-hours of each load (for the breakdown). */
  perLoad?: boolean;
  /** Start here instead of the input's start: charge (Ah), hour of the week, the disconnect's state. */
  startAh?: number;
  startHow?: number;
  lvdOn?: boolean;
  /** Steps per hour (1 by default): for the check that a finer step changes no figure. */
  substeps?: number;
};
