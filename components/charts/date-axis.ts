/**
 * Time-axis labels as dates in the viewer's zone: the day, with the hour when the view spans two days or
 * less. Plain code (no Skia), so screens can print the same dates beside a chart.
 */
export function dateLabel(spanMs: number) {
  const f = new Intl.DateTimeFormat(undefined, spanMs > 2 * 86_400_000 ? { day: 'numeric', month: 'short' } : { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });
  return (t: unknown) => f.format(new Date(Number(t)));
}

/** A moment in full, for the words under a chart: "20 Nov 2026, 18:00". */
export const dateTimeLabel = (t: number | string) => new Intl.DateTimeFormat(undefined, { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' }).format(new Date(t));

/** Ticks at local midnights for a view longer than two days (at most six, evenly thinned); none for a shorter one (the chart spaces them). */
export function midnightTicks(fromMs: number, toMs: number): number[] | undefined {
  if (toMs - fromMs <= 2 * 86_400_000) return undefined;
  const d = new Date(fromMs);
  const ticks: number[] = [];
  for (let t = new Date(d.getFullYear(), d.getMonth(), d.getDate() + 1).getTime(), i = 1; t <= toMs; t = new Date(d.getFullYear(), d.getMonth(), d.getDate() + ++i).getTime()) ticks.push(t);
  const step = Math.ceil(ticks.length / 6);
  return ticks.filter((_, i) => i % step === 0);
}
