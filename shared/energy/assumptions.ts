import { describeDriving, routineOf } from '../routines';
import type { Chemistry, RigPower } from '../schemas/projection';

// "How this was worked out": every assumption a projection used, with its value, where it comes from
// (a published source, "common practice" or "from memory", as in defaults.ts and docs/model.md, or the
// user's own setting) and where it is changed. The Outlook and the budget sheet show the same list.

export type Assumption = {
  key: string;
  label: string;
  value: string;
  source: string;
  /** Where the user changes it: the cut-off on the Outlook itself, the rest on Power. */
  changeOn: 'outlook' | 'power';
};

/** The projection's own account of what it resolved (Projection['assumptions']). */
type Resolved = Record<string, number | string | boolean | null>;

const LEAD_ACID = new Set<Chemistry>(['flooded', 'agm', 'gel']);
const YOURS = 'your setting';

const PEUKERT_SOURCE: Record<Chemistry, string> = {
  flooded: 'typical 1.2 to 1.3 for flooded lead-acid (from memory)',
  agm: 'typical 1.05 to 1.15 for AGM (from memory)',
  gel: 'between AGM and flooded (from memory)',
  lifepo4: 'typical 1.02 to 1.05 for LiFePO4 (from memory)',
};
const SELF_DISCHARGE_SOURCE: Record<Chemistry, string> = {
  flooded: '5 to 15 % a month by storage temperature (common practice)',
  agm: 'lead-acid 4 to 6 % a month (Darling, Encyclopedia of Alternative Energy)',
  gel: 'lead-acid 4 to 6 % a month (Darling, Encyclopedia of Alternative Energy)',
  lifepo4: 'lithium 2 to 3 % a month (Darling, Encyclopedia of Alternative Energy)',
};

const pct = (x: number) => `${Math.round(x * 1000) / 10} %`;
const num = (x: unknown) => (typeof x === 'number' ? x : Number(x));

export function explainAssumptions(power: RigPower, resolved: Resolved, horizonDays: number): Assumption[] {
  const b = power.battery;
  const chem = b.chemistry;
  const lead = LEAD_ACID.has(chem);
  const out: Assumption[] = [];
  const add = (key: string, label: string, value: string, source: string, changeOn: Assumption['changeOn'] = 'power') => out.push({ key, label, value, source, changeOn });

  const cutoffSource =
    b.cutoffSocPercent !== undefined
      ? YOURS
      : b.role === 'starter'
        ? 'a starting battery keeps a cranking reserve (common practice)'
        : lead
          ? 'about 50 % depth of discharge for lead-acid (common practice)'
          : 'about 80 % depth of discharge for LiFePO4 (common practice)';
  add('cutoff', 'Cut-off (lowest state of charge counted)', `${num(resolved.cutoffSocPercent)} %`, cutoffSource, 'outlook');
  add('usable', 'Usable capacity', `${num(resolved.usableAh)} Ah of ${b.capacityAh} Ah rated (health ${b.healthPercent} % × temperature factor)`, 'rated capacity at the 20-hour rate × health × temperature factor (model convention)');
  add(
    'temperature',
    'Temperature factor',
    `${num(resolved.temperatureFactor)} at ${b.temperatureC} °C`,
    b.temperatureFactor !== undefined ? YOURS : lead ? 'about 75 % of capacity at 0 °C, 40 % at −18 °C (US Army TM 10-6140-200-14, 1-9a)' : 'about 90 % at 0 °C, 70 % at −20 °C for LiFePO4 (from memory)',
  );
  add('peukert', 'Peukert exponent', String(num(resolved.peukertExponent)), b.peukertExponent !== undefined ? YOURS : PEUKERT_SOURCE[chem]);
  add('rated-hours', 'Capacity rating', `${num(resolved.ratedHours)}-hour rate`, b.ratedHours !== undefined ? YOURS : 'the usual rating of leisure batteries (common practice)');
  add('charge-efficiency', 'Charge efficiency', pct(num(resolved.chargeEfficiency)), b.chargeEfficiencyPercent !== undefined ? YOURS : lead ? 'lead-acid 0.80 to 0.90 (common practice)' : 'LiFePO4 0.95 to 0.99 (common practice)');
  add('self-discharge', 'Self-discharge', `${num(resolved.selfDischargePercentPerMonth)} % a month`, b.selfDischargePercentPerMonth !== undefined ? YOURS : SELF_DISCHARGE_SOURCE[chem]);
  add('acceptance', 'Charge acceptance', `${num(resolved.bulkAcceptanceA)} A in bulk, tapering above ${num(resolved.taperStartSocPercent)} %`, b.bulkAcceptanceC !== undefined ? YOURS : lead ? 'a lead-acid battery takes about 0.1 to 0.3 C in bulk, less as it fills (from memory)' : 'LiFePO4 charges at up to about 0.5 C (common practice)');
  if (power.inverter) {
    const inv = power.inverter;
    add('inverter-efficiency', 'Inverter efficiency', pct(num(resolved.inverterEfficiency)), inv.efficiencyPercent === 90 ? 'designers assume about 90 % (Home Power, "Designing a Stand-Alone PV System")' : YOURS);
    add('inverter-idle', 'Inverter idle draw', `${inv.idleA} A whenever it is powered`, `${YOURS}; small 12 V inverters draw 0.2 to 0.8 A (common practice)`);
    if (resolved.lvdSocPercent !== null && inv.control === 'low-voltage-disconnect') {
      add('lvd', 'Low-voltage disconnect', `switches the inverter off at ${num(resolved.lvdSocPercent)} %`, inv.lvdSocPercent !== undefined ? YOURS : '10 points above the cut-off, saving the rest for DC loads (model choice)');
    }
  }
  add('key-off', 'Vehicle key-off draw', `${power.keyOffDrawA} A`, YOURS);
  const ch = power.charging;
  if (ch.solarW > 0) add('solar', 'Solar', `${ch.solarW} W × ${ch.peakSunHours} peak sun hours × ${pct(num(resolved.solarDerate))} derate`, ch.solarDeratePercent !== undefined ? YOURS : 'a 75 % derate for wiring, heat, dirt and controller losses (common practice)');
  if (ch.shore && ch.shore.amps > 0) add('shore', 'Shore power', `${ch.shore.amps} A for ${ch.shore.hoursPerDay} h from ${ch.shore.startHour}:00 on ${ch.shore.weekdays.length} days a week`, YOURS);
  const routine = routineOf(ch);
  add('routine', 'Routine', `${routine.name}: ${describeDriving(ch.drivingMinutesPerDay, ch.drivingStartHour)}, ${ch.alternatorA} A through ${ch.charger === 'dc-dc' ? 'a DC-DC charger' : 'a relay'}`, YOURS);
  add('stay', 'Planned stay', `${power.plannedStayDays} days`, YOURS);
  add('horizon', 'Horizon', `${horizonDays} days from ${['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'][power.start.weekday]} ${power.start.hour}:00 at ${b.startSocPercent} % charge`, YOURS);
  return out;
}
