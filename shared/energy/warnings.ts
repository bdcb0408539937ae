import type { ProjectionInput } from '../schemas/projection';
import { LEAD_ACID_FREEZING_CURVE, MODEL_DEFAULTS, temperatureFactor } from './defaults';
import { listNames } from './words';
import { socketOverloadWarning } from './hookup/socket';
import type { DemandProfile } from './profile';
import type { Resolved } from './resolve';
import { round } from './round';

/** A warning: its code, its message, and the figures in the message (for texts that follow the unit setting). */
export type Warning = { code: string; message: string; figures?: Record<string, number | string | null> };

/** Freezing point of a lead-acid battery's electrolyte at a state of charge (from memory; see defaults.ts). */
export function leadAcidFreezingC(socPercent: number): number {
  // The curve is [% charged, °C]; temperatureFactor interpolates any [x, y] curve.
  return temperatureFactor(LEAD_ACID_FREEZING_CURVE, socPercent);
}

type RunFigures = { parkedMinSoc: number; routineMinSoc: number; maxAcWatts: number; acNotServedAhPerDay: number; coverDays: number };

export function collectWarnings(input: ProjectionInput, r: Resolved, demand: DemandProfile, f: RunFigures): Warning[] {
  const warnings: Warning[] = [];
  const inv = r.inverter;
  const leadAcid = r.chemistry !== 'lifepo4';
  const lowest = Math.min(f.parkedMinSoc, f.routineMinSoc);
  if (inv?.control === 'ignition-relay') {
    const cut = demand.loads.filter((lp) => lp.ac && lp.runsParked).map((lp) => lp.load.name);
    if (cut.length) {
      const ahPerDay = round(f.acNotServedAhPerDay, 1);
      warnings.push({
        code: 'ac-loads-cut-while-parked',
        message: `${input.inverter?.connection === 'socket' ? 'On a socket live only with the ignition' : 'On an ignition relay'} the inverter is off while parked, so ${listNames(cut)} cannot run then (${ahPerDay} Ah a day not served).`,
        figures: { ahPerDayNotServed: ahPerDay, loads: cut.join(', ') },
      });
    }
  }
  if (r.role === 'starter' && lowest < r.cutoffSoc) {
    const reserve = round(r.cutoffSoc, 1);
    warnings.push({
      code: 'starter-below-reserve',
      message: `The starting battery is projected below its cranking reserve of ${reserve} %${r.temperatureC < 27 ? ` (raised for ${r.temperatureC} °C, where it cranks with less power)` : ''}: the engine may not start.`,
      figures: { cutoffSocPercent: reserve, temperatureC: r.temperatureC },
    });
  }
  if (inv && f.maxAcWatts > inv.ratedW) {
    warnings.push({
      code: 'inverter-overloaded',
      message: `AC loads scheduled together draw up to ${round(f.maxAcWatts, 0)} W, more than the inverter's ${inv.ratedW} W rating.`,
      figures: { watts: round(f.maxAcWatts, 0), ratedW: inv.ratedW },
    });
  }
  const socket = socketOverloadWarning(input, f.maxAcWatts);
  if (socket) warnings.push(socket);
  const charges = r.alternatorA > 0 || r.solarW > 0 || r.shoreByHourOfWeek.some((x) => x > 0);
  if (r.frozen && charges) {
    warnings.push(
      r.selfHeating
        ? {
            code: 'lifepo4-cold-charge',
            message: `A LiFePO4 battery must not be charged below 0 °C. This one heats itself: the model gives its heater about ${round(r.heaterA * r.systemVoltage, 0)} W from the charging source for the first ${round(r.heaterWarmupHours * 60, 0)} minutes of each charge, and stores nothing until then.`,
            figures: { heaterW: round(r.heaterA * r.systemVoltage, 0), warmupMinutes: round(r.heaterWarmupHours * 60, 0) },
          }
        : {
            code: 'lifepo4-cold-charge',
            message: 'A LiFePO4 battery must not be charged below 0 °C: its protection system blocks charging, so the model puts nothing into it from driving, solar or shore (they still run the loads while on). A self-heating battery, or a warmer place for it, lets it charge.',
            figures: { temperatureC: r.temperatureC },
          },
    );
  }
  if (r.chemistry === 'lifepo4' && r.charger === 'relay' && r.alternatorA > 0) {
    warnings.push({
      code: 'lifepo4-on-relay',
      message: 'A LiFePO4 bank on a plain relay can draw more than the alternator is built to give for long and overheat it: a DC-DC charger limits the current.',
    });
  }
  if (leadAcid) {
    const freezesAt = round(leadAcidFreezingC(Math.max(0, lowest)), 0);
    if (r.temperatureC <= freezesAt) {
      warnings.push({
        code: 'lead-acid-may-freeze',
        message: `At ${round(lowest, 0)} % charge a lead-acid battery's electrolyte freezes near ${freezesAt} °C, and the battery is projected to reach it at ${r.temperatureC} °C: keep it charged or warm, a frozen battery can crack.`,
        figures: { socPercent: round(lowest, 0), freezesAtC: freezesAt, temperatureC: r.temperatureC },
      });
    }
  }
  if (input.battery.temperatureC < -18 && leadAcid) {
    warnings.push({
      code: 'temperature-below-table',
      message: 'Below -18 °C the capacity follows the cranking power of TM 5-4210-230-14&P-1 Table 3 (a model choice, not a measured capacity): real capacity may differ.',
    });
  }
  if (input.plannedStayDays > input.horizonDays) {
    const capped = f.coverDays >= MODEL_DEFAULTS.maxRunDays;
    warnings.push({
      code: 'stay-beyond-horizon',
      message: `The planned stay is longer than the horizon: the margin is worked over ${f.coverDays} days${capped ? ' (the longest run)' : ''}, the chart shows the horizon.`,
      figures: { coveredDays: f.coverDays },
    });
  }
  return warnings;
}
