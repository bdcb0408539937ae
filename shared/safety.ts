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

/** On every hook-up plan and every drawing of one (PRODUCT.md, Safety). */
export const HOOKUP_CAUTIONS = [
  'Fit the fuse or breaker as close to the battery as possible: within 7 in (178 mm) of the terminal, or 40 in (1 m) if the cable is sheathed (33 CFR 183.455).',
  'Use crimped terminals of the right size, support the cable and give it strain relief; protect it where it passes through metal.',
  'Disconnect the battery before any work. A lead-acid battery can vent explosive gas; a lithium battery needs its protection system; an inverter\'s AC output can kill.',
  'These figures are estimates, not a guarantee. Follow local codes and have a qualified auto electrician check the installation.',
];
