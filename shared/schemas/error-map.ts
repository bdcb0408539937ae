import { z } from 'zod';

// Plain messages for every schema, on the form and in the server's 400 answers alike: each names its field
// ("Battery capacity must be at least 1 Ah.") instead of the validator's own words ("Too small: expected
// number to be >=1"). A schema's own message (`min(1, 'Give the rig a name.')`) still wins.

/** The field's name in words and its unit, by the last key of its path. */
const FIELDS: Record<string, [string, string?]> = {
  name: ['Name'],
  vehicle: ['Vehicle'],
  email: ['E-mail'],
  password: ['Password'],
  body: ['Note'],
  note: ['Note'],
  caption: ['Caption'],
  label: ['Name'],
  from: ['From'],
  to: ['To'],
  systemVoltage: ['System voltage', 'V'],
  capacityAh: ['Battery capacity', 'Ah'],
  healthPercent: ['Battery health', '%'],
  temperatureC: ['Battery temperature', '°C'],
  startSocPercent: ['Charge at the start', '%'],
  cutoffSocPercent: ['Cut-off', '%'],
  ratedW: ['Inverter rating', 'W'],
  efficiencyPercent: ['Inverter efficiency', '%'],
  idleA: ['Idle draw', 'A'],
  lvdSocPercent: ['Disconnect level', '%'],
  keyOffDrawA: ['Key-off draw', 'A'],
  watts: ['Power', 'W'],
  amps: ['Current', 'A'],
  dutyPercent: ['Duty cycle', '%'],
  hoursPerDay: ['Hours a day', 'h'],
  startHour: ['Start time'],
  quantity: ['How many'],
  alternatorA: ['Alternator charge current', 'A'],
  drivingMinutesPerDay: ['Minutes of driving', 'min'],
  drivingStartHour: ['Driving start time'],
  solarW: ['Solar panels', 'W'],
  peakSunHours: ['Peak sun hours', 'h'],
  plannedStayDays: ['Planned stay', 'days'],
  horizonDays: ['Horizon', 'days'],
  lengthM: ['Length', 'm'],
  currentA: ['Current', 'A'],
  maxDropPercent: ['Allowed voltage drop', '%'],
  voltageV: ['Battery voltage', 'V'],
  batteryV: ['Voltage at the battery', 'V'],
  pointV: ['Voltage at the device or ground point', 'V'],
  socPercent: ['State of charge', '%'],
  at: ['When'],
  reportHour: ['Report time'],
  timeZone: ['Time zone'],
  warnAt: ['Warning level'],
  supply: ['Supply'],
  chemistry: ['Chemistry'],
  role: ['Role'],
};
const WEEKDAYS = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'];

/** "capacityAh" → "Battery capacity"; an unknown key in words ("maxDropPercent" → "Max drop percent"). */
export function fieldOf(path: readonly PropertyKey[] | undefined): { name: string; unit?: string } {
  const keys = (path ?? []).filter((k): k is string => typeof k === 'string');
  const key = keys[keys.length - 1];
  if (!key) return { name: 'This field' };
  const known = FIELDS[key];
  const last = path?.[path.length - 1];
  if (key === 'drivingMinutesPerDay' && typeof last === 'number') return { name: `${WEEKDAYS[last] ?? 'A day'}'s driving`, unit: 'min' };
  if (known) return { name: known[0], unit: known[1] };
  const words = key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();
  return { name: words.charAt(0).toUpperCase() + words.slice(1) };
}

const withUnit = (n: unknown, unit?: string) => {
  const v = typeof n === 'bigint' ? Number(n) : (n as number);
  const shown = typeof v === 'number' ? v.toLocaleString('en-US') : String(n);
  return unit ? `${shown}${unit === '%' ? ' %' : ` ${unit}`}` : shown;
};

export const plainErrorMap: z.core.$ZodErrorMap = (issue) => {
  const { name, unit } = fieldOf(issue.path);
  switch (issue.code) {
    case 'invalid_type':
      if (issue.expected === 'number') return `${name} needs a number.`;
      if (issue.expected === 'int') return `${name} must be a whole number.`;
      if (issue.input === undefined) return `${name} is needed.`;
      return `${name} is not valid.`;
    case 'too_small':
      if (issue.origin === 'string') return Number(issue.minimum) <= 1 ? `${name} can't be empty.` : `${name} needs at least ${issue.minimum} characters.`;
      if (issue.origin === 'array') return `Choose at least ${issue.minimum} for ${name.toLowerCase()}.`;
      return issue.inclusive ? `${name} must be at least ${withUnit(issue.minimum, unit)}.` : `${name} must be more than ${withUnit(issue.minimum, unit)}.`;
    case 'too_big':
      if (issue.origin === 'string') return `${name} can be at most ${issue.maximum} characters.`;
      if (issue.origin === 'array') return `${name} can have at most ${issue.maximum}.`;
      return issue.inclusive ? `${name} can be at most ${withUnit(issue.maximum, unit)}.` : `${name} must be less than ${withUnit(issue.maximum, unit)}.`;
    case 'invalid_format':
      if (issue.format === 'email') return `${name} must be an e-mail address.`;
      if (issue.format === 'datetime') return `${name} must be a date and time.`;
      return `${name} is not in the right form.`;
    case 'not_multiple_of':
      return `${name} must be a whole number.`;
    case 'invalid_value':
      return `Choose one of the ${name.toLowerCase()} options.`;
    case 'unrecognized_keys':
      return `Unknown field${issue.keys.length > 1 ? 's' : ''}: ${issue.keys.join(', ')}.`;
    default:
      return `${name} is not valid.`;
  }
};

z.config({ customError: plainErrorMap });
