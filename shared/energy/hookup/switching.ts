import type { InverterControl } from '../../schemas/projection';
import { coilFuseA, ISO_RELAY_CONTACTS_A, RELAY_COIL_A, SOLENOID_COIL_A, switchRatingFor } from './feed';
import type { HookupPart, HookupWarning } from './parts';

/** The part (or parts) that switch the inverter, by its control, rated for the feed's protection. */
export function controlParts(
  control: InverterControl,
  switchAt: 'battery' | 'elsewhere',
  remoteOnOff: boolean,
  fuseA: number | null,
  systemVoltage: number,
  lvdSocPercent: number,
): { parts: HookupPart[]; warnings: HookupWarning[] } {
  const rating = fuseA === null ? null : switchRatingFor(fuseA);
  const weakLink = `Rated at least ${rating ?? '?'} A continuous, as high as the fuse ahead of it, so the fuse and not the contacts is the weak link (common practice).`;
  switch (control) {
    case 'always-on':
      return {
        parts: [],
        warnings: [
          {
            code: 'no-switch',
            message: 'Nothing in this hook-up switches the inverter off: its idle draw runs day and night. See the Fixes for a switch, an ignition relay or a low-voltage disconnect.',
          },
        ],
      };
    case 'manual-switch':
      // At the battery the switching breaker (the protection part) already is the switch.
      if (switchAt === 'battery') return { parts: [], warnings: [] };
      return {
        parts: [
          {
            kind: 'switch',
            label: `Battery switch, ≥ ${rating ?? '?'} A continuous`,
            ratingA: rating,
            notes: ['A separate switch where a switching breaker will not fit, for example within reach of the seat; the fuse stays at the battery.', weakLink],
          },
        ],
        warnings: [],
      };
    case 'ignition-relay':
      return ignitionParts(rating, remoteOnOff, systemVoltage, weakLink);
    case 'low-voltage-disconnect':
      return {
        parts: [
          {
            kind: 'low-voltage-disconnect',
            label: `Low-voltage disconnect, ≥ ${rating ?? '?'} A, off at ${lvdSocPercent} %`,
            ratingA: rating,
            notes: [
              `Sits after the fuse and opens the feed when the battery falls to its set point (${lvdSocPercent} % state of charge here), leaving the rest for the DC loads.`,
              weakLink,
              'It draws a little itself; set its voltage for the battery\'s chemistry.',
            ],
          },
        ],
        warnings: [],
      };
  }
}

function ignitionParts(rating: number | null, remoteOnOff: boolean, systemVoltage: number, weakLink: string) {
  const coil = (coilA: number): HookupPart => ({
    kind: 'coil-fuse',
    label: `${coilFuseA(coilA)} A coil fuse, accessory circuit`,
    ratingA: coilFuseA(coilA),
    notes: [
      `The coil (about ${coilA} A at ${systemVoltage} V, from memory) is fed from an ignition-switched accessory circuit through its own small fuse, so the contacts close only while the vehicle runs.`,
      'Fit a diode across the coil, or use a relay with one, where the vehicle\'s electronics share the circuit (common practice).',
    ],
  });
  if (remoteOnOff) {
    return {
      parts: [
        coil(RELAY_COIL_A),
        {
          kind: 'remote-switch' as const,
          label: `${ISO_RELAY_CONTACTS_A[0]} A relay on the inverter's remote on/off input`,
          ratingA: ISO_RELAY_CONTACTS_A[0],
          notes: [
            'The relay switches only the inverter\'s remote input (a few milliamps); the feed stays fused and connected, so no contact carries the feed.',
            'Switched off this way an inverter still draws a small standby current: check its manual.',
          ],
        },
      ],
      warnings: [],
    };
  }
  const contacts = rating === null ? null : ISO_RELAY_CONTACTS_A.find((c) => c >= rating) ?? null;
  if (contacts !== null) {
    return {
      parts: [
        coil(RELAY_COIL_A),
        {
          kind: 'relay' as const,
          label: `Ignition relay, ${contacts} A contacts`,
          ratingA: contacts,
          notes: [`Common automotive relays (ISO 280/mini) carry 30 or 40 A on their contacts (common practice).`, weakLink],
        },
      ],
      warnings: [],
    };
  }
  return {
    parts: [
      coil(SOLENOID_COIL_A),
      {
        kind: 'relay' as const,
        label: `Continuous-duty solenoid, ≥ ${rating ?? '?'} A`,
        ratingA: rating,
        notes: [
          `An ISO relay's 30 or 40 A contacts cannot carry this feed (common practice): use a continuous-duty solenoid (not a starter solenoid, which is rated for seconds), or a relay on the inverter's remote on/off input where it has one.`,
          weakLink,
        ],
      },
    ],
    warnings: [
      {
        code: 'relay-contacts-too-small',
        message: `The feed needs contacts of at least ${rating ?? '?'} A, more than a 40 A automotive relay carries: the plan uses a continuous-duty solenoid. If the inverter has a remote on/off input, a small relay on that input is simpler.`,
      },
    ],
  };
}
