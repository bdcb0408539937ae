// A generated log (not a real one): a 100 Ah flooded battery resting from 12.65 V to 12.45 V over 50 hours.
// BCI table (REFERENCES.md, Batteries): 12.65 V = 100 %, 12.45 V = 75 %: 25 Ah in 50 h = 0.5 A.
export function restingLog(hours = 50, from = 12.65, to = 12.45) {
  const start = Date.parse('2026-11-20T18:00:00Z');
  return Array.from({ length: hours + 1 }, (_, h) => ({ at: new Date(start + h * 3_600_000).toISOString(), voltageV: Math.round((from + ((to - from) * h) / hours) * 1000) / 1000, rested: true }));
}
