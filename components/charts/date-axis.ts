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
