import type { FixKind } from './energy/fixes';
import type { InverterControl } from './schemas/projection';

// The names of the ways an inverter is switched, and of the Fixes, wherever a screen, the budget sheet or
// the History shows them: one place to rename one.

/** The ways to switch an inverter, in the order the forms offer them. */
export const INVERTER_CONTROLS: readonly InverterControl[] = ['always-on', 'manual-switch', 'ignition-relay', 'low-voltage-disconnect'];

/** The Power screen's choice. */
export const CONTROL_LABELS: Record<InverterControl, string> = {
  'always-on': 'Always on',
  'manual-switch': 'Manual switch',
  'ignition-relay': 'Ignition relay',
  'low-voltage-disconnect': 'Low-voltage disconnect',
};

/** The New rig form's choice, in the plainer words of someone setting up a first rig. */
export const CONTROL_PLAIN_LABELS: Record<InverterControl, string> = {
  'always-on': 'Left on',
  'manual-switch': 'By hand when needed',
  'ignition-relay': 'Ignition relay',
  'low-voltage-disconnect': 'Low-voltage disconnect',
};

/** In a sentence: "the inverter is …" (the Hook-up's "Now:" title). */
export const CONTROL_PHRASES: Record<InverterControl, string> = {
  'always-on': 'always on',
  'manual-switch': 'on a manual switch',
  'ignition-relay': 'on an ignition-keyed relay',
  'low-voltage-disconnect': 'on a low-voltage disconnect',
};

/** A choice field's options from one of the label sets above. */
export const controlOptions = (labels: Record<InverterControl, string>) => INVERTER_CONTROLS.map((value) => ({ value, label: labels[value] }));

/** The inverter Fixes and the control each gives the inverter. */
export const FIX_CONTROL: Partial<Record<FixKind, InverterControl>> = {
  'cutoff-switch': 'manual-switch',
  'ignition-relay': 'ignition-relay',
  'low-voltage-disconnect': 'low-voltage-disconnect',
};

/** A Fix's title on the Outlook and the budget sheet. */
export const FIX_TITLES: Record<FixKind, string> = {
  'cutoff-switch': 'Cut-off switch on the inverter',
  'ignition-relay': 'Ignition-keyed relay',
  'low-voltage-disconnect': 'Low-voltage disconnect',
  'more-driving': 'More driving',
  'more-battery': 'More battery',
  'house-battery': 'A separate house battery',
  solar: 'Solar',
};

/** An inverter Fix's short name on the Hook-up's chips and its "With this Fix:" title. */
export const INVERTER_FIX_NAMES: Partial<Record<FixKind, string>> = {
  'cutoff-switch': 'Cut-off switch',
  'ignition-relay': 'Ignition-keyed relay',
  'low-voltage-disconnect': 'Low-voltage disconnect',
};

/** A Fix's name inside a sentence (the History's "applied the Fix “…”"). */
export const FIX_NAMES: Record<FixKind, string> = {
  'cutoff-switch': 'cut-off switch',
  'ignition-relay': 'ignition-keyed relay',
  'low-voltage-disconnect': 'low-voltage disconnect',
  'more-driving': 'more driving',
  'more-battery': 'more battery',
  solar: 'solar',
  'house-battery': 'separate house battery',
};
