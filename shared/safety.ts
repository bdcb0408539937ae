import type { FixKind } from './energy/project';

/** Fixes that mean wiring work; wherever one is recommended (screen or e-mail) the caution goes with it. */
export const WIRING_FIX_KINDS: readonly FixKind[] = ['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect', 'solar', 'more-battery'];

export const FIX_WIRING_CAUTION =
  'Wiring changes: fit protection as close to the battery as possible, use proper terminals and strain relief, disconnect the battery before work, and follow local codes and a qualified auto electrician. These figures are estimates, not a guarantee.';

export const needsWiringCaution = (fixes: { kind: FixKind }[]) => fixes.some((f) => WIRING_FIX_KINDS.includes(f.kind));
