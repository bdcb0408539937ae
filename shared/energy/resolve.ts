import type { InverterControl, ProjectionInput } from '../schemas/projection';
import { CHEMISTRY_DEFAULTS, MODEL_DEFAULTS, starterCutoffSoc, temperatureFactor } from './defaults';
import { type CalendarInputs, calendarOf } from './calendar';
import { drivingFractions, HOURS_PER_WEEK, solarCurrents, zeros } from './profile';
import { weekdayOf } from './solar';

/** The input with every default filled in: what one run of the model needs, besides the demand profile. */
export type Resolved = {
  systemVoltage: number;
  chemistry: ProjectionInput['battery']['chemistry'];
  role: ProjectionInput['battery']['role'];
  ratedAh: number;
  usableAh: number;
  temperatureC: number;
  temperatureFactor: number;
  ratedHours: number;
  ratedCurrentA: number;
  peukertExponent: number;
  chargeEfficiency: number;
  selfDischargeAPerHour: number;
  selfDischargePercentPerMonth: number;
  cutoffSoc: number;
  startSoc: number;
  bulkAcceptanceA: number;
  taperStartSoc: number;
  taperFloorA: number;
  /** LiFePO4 below 0 °C: its protection system blocks charging (common practice). */
  frozen: boolean;
  selfHeating: boolean;
  heaterA: number;
  heaterWarmupHours: number;
  charger: 'relay' | 'dc-dc';
  /** Taper start while the alternator charges (a DC-DC charger holds its current to 95 %). */
  alternatorTaperStartSoc: number;
  relayJoinMinutes: number;
  inverter: null | {
    control: InverterControl;
    efficiency: number;
    idleA: number;
    ratedW: number;
    lvdSoc: number;
    lvdReconnectPoints: number;
  };
  keyOffA: number;
  alternatorA: number;
  drivingMinutesPerDay: number[];
  drivingStartHour: number;
  driving: number[];
  /** Fraction of each hour of the week the alternator charges (driving, once a relay has joined). */
  joined: number[];
  solarW: number;
  peakSunHours: number;
  solarDerate: number;
  solarByHourOfDay: number[];
  shoreByHourOfWeek: number[];
  horizonHours: number;
  startHourOfWeek: number;
} & CalendarInputs;

const LEAD_ACID = new Set(['flooded', 'agm', 'gel']);

export function resolve(input: ProjectionInput): Resolved {
  const b = input.battery;
  const chem = CHEMISTRY_DEFAULTS[b.chemistry];
  const tf = b.temperatureFactor ?? temperatureFactor(chem.temperatureCurve, b.temperatureC);
  const usableAh = b.capacityAh * (b.healthPercent / 100) * tf;
  const ratedHours = b.ratedHours ?? MODEL_DEFAULTS.ratedHours;
  const cutoffSoc = b.cutoffSocPercent ?? (b.role === 'starter' ? starterCutoffSoc(chem.cutoffSocStarter, b.temperatureC) : chem.cutoffSocHouse);
  const sdPercent = b.selfDischargePercentPerMonth ?? chem.selfDischargePercentPerMonth;
  const ch = input.charging;
  const derate = (ch.solarDeratePercent ?? MODEL_DEFAULTS.solarDerate * 100) / 100;
  const V = input.systemVoltage;
  const inv = input.inverter;
  const shore = zeros(HOURS_PER_WEEK);
  if (ch.shore && ch.shore.amps > 0) {
    for (const day of new Set(ch.shore.weekdays)) {
      let t = day * 24 + ch.shore.startHour;
      let left = ch.shore.hoursPerDay;
      while (left > 1e-12) {
        const part = Math.min(1, left);
        shore[t % HOURS_PER_WEEK] += ch.shore.amps * part;
        left -= part;
        t++;
      }
    }
  }
  // Cold lead-acid accepts less charge: its acceptance falls with its capacity (model choice, docs/model.md).
  const acceptanceFactor = LEAD_ACID.has(b.chemistry) ? tf : 1;
  const taperStartSoc = b.taperStartSocPercent ?? chem.taperStartSoc;
  const relayJoinMinutes = ch.charger === 'relay' ? (ch.relayJoinMinutes ?? MODEL_DEFAULTS.relayJoinMinutes) : 0;
  const driving = drivingFractions(ch.drivingMinutesPerDay, ch.drivingStartHour);
  return {
    systemVoltage: V,
    chemistry: b.chemistry,
    role: b.role,
    ratedAh: b.capacityAh,
    usableAh,
    temperatureC: b.temperatureC,
    temperatureFactor: tf,
    ratedHours,
    ratedCurrentA: b.capacityAh / ratedHours,
    peukertExponent: b.peukertExponent ?? chem.peukertExponent,
    chargeEfficiency: (b.chargeEfficiencyPercent ?? chem.chargeEfficiency * 100) / 100,
    // Self-discharge is a share of the battery's capacity per month (30 days).
    selfDischargeAPerHour: (usableAh * sdPercent) / 100 / (30 * 24),
    selfDischargePercentPerMonth: sdPercent,
    cutoffSoc,
    startSoc: b.startSocPercent,
    bulkAcceptanceA: (b.bulkAcceptanceC ?? chem.bulkAcceptanceC) * b.capacityAh * acceptanceFactor,
    taperStartSoc,
    taperFloorA: MODEL_DEFAULTS.taperFloorC * b.capacityAh * acceptanceFactor,
    frozen: b.chemistry === 'lifepo4' && b.temperatureC < 0,
    selfHeating: b.selfHeating,
    heaterA: (b.heaterW ?? MODEL_DEFAULTS.heaterW) / V,
    heaterWarmupHours: (b.heaterWarmupMinutes ?? MODEL_DEFAULTS.heaterWarmupMinutes) / 60,
    charger: ch.charger,
    alternatorTaperStartSoc: ch.charger === 'dc-dc' ? Math.max(taperStartSoc, MODEL_DEFAULTS.dcdcTaperStartSoc) : taperStartSoc,
    relayJoinMinutes,
    inverter: inv
      ? {
          // A socket live only with the ignition switches the inverter as an ignition relay would.
          control: inv.connection === 'socket' && inv.socketSwitched ? 'ignition-relay' : inv.control,
          efficiency: inv.efficiencyPercent / 100,
          idleA: inv.idleA,
          ratedW: inv.ratedW,
          lvdSoc: inv.lvdSocPercent ?? Math.min(100, cutoffSoc + MODEL_DEFAULTS.lvdPointsAboveCutoff),
          lvdReconnectPoints: inv.lvdReconnectPoints ?? MODEL_DEFAULTS.lvdReconnectPoints,
        }
      : null,
    keyOffA: input.keyOffDrawA,
    alternatorA: ch.alternatorA,
    drivingMinutesPerDay: [...ch.drivingMinutesPerDay],
    drivingStartHour: ch.drivingStartHour,
    driving,
    joined: relayJoinMinutes > 0 ? drivingFractions(ch.drivingMinutesPerDay, ch.drivingStartHour, relayJoinMinutes) : driving,
    solarW: ch.solarW,
    peakSunHours: ch.peakSunHours,
    solarDerate: derate,
    solarByHourOfDay: solarCurrents(
      ch.solarW,
      ch.peakSunHours,
      derate,
      V,
      MODEL_DEFAULTS.daylightStartHour,
      MODEL_DEFAULTS.daylightEndHour,
    ),
    shoreByHourOfWeek: shore,
    horizonHours: input.horizonDays * 24,
    startHourOfWeek: (input.start.date ? weekdayOf(input.start.date) : input.start.weekday) * 24 + input.start.hour,
    ...calendarOf(input, derate),
  };
}
