import type { FixKind } from './energy/fixes';

// Every caution and safety text of the app, in one place (PRODUCT.md, Safety): wiring advice always comes
// with these, and defers to local codes and a qualified auto electrician.

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

/** The cautions after the placement of the protection, the same on a cable run and a hook-up plan. */
const WORK_CAUTIONS = [
  'Use crimped terminals of the right size, support the cable and give it strain relief; protect it where it passes through metal.',
  'Disconnect the battery before any work. A lead-acid battery can vent explosive gas; a lithium battery needs its protection system; an inverter\'s AC output can kill.',
  'These figures are estimates, not a guarantee. Follow local codes and have a qualified auto electrician check the installation.',
];

/** On every hook-up plan and every drawing of one (PRODUCT.md, Safety). */
export const HOOKUP_CAUTIONS = [
  'Fit the fuse or breaker as close to the battery as possible: within 7 in (178 mm) of the terminal, or 40 in (1 m) if the cable is sheathed (33 CFR 183.455).',
  ...WORK_CAUTIONS,
];

/** On every cable run's sizing. */
export const CABLE_CAUTIONS = [
  'Fit the fuse or breaker as close to the battery as possible: within 7 in (178 mm) of the source, or 40 in (1 m) if the conductor is sheathed (33 CFR 183.455).',
  ...WORK_CAUTIONS,
];

/** First on a cable run whose return runs through the body, with the allowance for the ground joints. */
export const chassisReturnCaution = (groundMilliOhm: number) =>
  `The return runs through the chassis: only the positive length counts, plus ${groundMilliOhm} mΩ for the ground joints. A poor ground point shows up as extra drop; measure it under load (see Readings).`;

/** First on a hook-up plan: the inverter maker's instructions win over the model's sizes. */
export const MAKER_FIRST = 'The inverter maker\'s own fuse and cable instructions come first: where its manual names a fuse or a cable size, fit that.';

/** Beside a breaker that protects an inverter feed. */
export const WHY_NOT_TYPE_I =
  'Never an automatic-reset (SAE J553 type I) breaker here: it recloses by itself while a fault lasts, heating a shorted feed again and again, and it can restart the inverter unattended. Use a fuse or a manual-reset, trip-free (type III) breaker.';

/** The breaker a sized cable run names, on an inverter feed and elsewhere. */
export const BREAKER_ADVICE = {
  inverter: 'A manual-reset breaker on the inverter feed doubles as its cut-off switch. Avoid automatic-reset (type I) breakers here: they cycle into a fault and can restart the inverter unattended.',
  general: 'A manual-reset (type III) breaker stays open until you reset it. Automatic-reset (type I) breakers cycle while a fault lasts; modified-reset (type II) ones reset only when power is removed.',
} as const;

/** A cable run for an AC load: its circuit is mains wiring, which these tables do not size. */
export const MAINS_WIRING_WARNING =
  "This load runs on the inverter's AC output: its circuit is mains wiring, outside these 12 V tables. Have it wired to local code by a qualified electrician, and size the inverter's own feed instead (link a run to the inverter).";

/** On Readings, above the forms: how to measure without getting hurt. */
export const MEASURING_CAUTION =
  'Measuring safely: clip the meter to the battery posts themselves; for a rested reading leave the battery two hours with no charging and nothing switched on. Under load, keep hands and leads clear of the fan and belts, never bridge the terminals with a probe, wear eye protection near a lead-acid battery (it can vent explosive gas), and leave a lithium battery\'s protection system alone. If in doubt, ask a qualified auto electrician. Figures are estimates, not a guarantee.';
