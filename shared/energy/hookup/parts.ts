/** The parts of an inverter's hook-up (plan.ts) and its warnings. */

export type HookupPartKind =
  | 'battery'
  | 'protection'
  | 'switching-breaker'
  | 'switch'
  | 'relay'
  | 'remote-switch'
  | 'coil-fuse'
  | 'low-voltage-disconnect'
  | 'socket'
  | 'conductor'
  | 'inverter'
  | 'return';
export type HookupPart = { kind: HookupPartKind; label: string; ratingA: number | null; notes: string[] };
export type HookupWarning = { code: string; message: string };
