import type { FixKind } from './energy/project';

/** Fixes that mean wiring work; wherever one is recommended (screen or e-mail) the caution goes with it. */
export const WIRING_FIX_KINDS: readonly FixKind[] = ['cutoff-switch', 'ignition-relay', 'low-voltage-disconnect', 'solar', 'more-battery'];

export const FIX_WIRING_CAUTION =
  'Wiring changes: fit protection as close to the battery as possible, use proper terminals and strain relief, disconnect the battery before work, and follow local codes and a qualified auto electrician. These figures are estimates, not a guarantee.';

export const needsWiringCaution = (fixes: { kind: FixKind }[]) => fixes.some((f) => WIRING_FIX_KINDS.includes(f.kind));

/** The usual cautions, printed in full on the budget sheet (which may reach someone who never saw the app). */
export const GENERAL_CAUTIONS: readonly string[] = [
  'Wiring a vehicle can start a fire: fit a fuse or circuit breaker on every positive feed, as close to the battery as possible, sized for the wire.',
  'A lead-acid battery can vent explosive gas: keep sparks and flames away and ventilate it; a lithium battery needs its own protection system.',
  "An inverter's AC output can kill: treat it as mains.",
  'Disconnect the battery before work, use proper terminals and strain relief, and follow local codes and a qualified auto electrician.',
  'These figures are estimates from the model and its assumptions, not a guarantee.',
];
