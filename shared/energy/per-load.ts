import * as layout from './profile';
import { type DemandProfile, peukertFactor, zeros } from './profile';

// A module-level copy: imported bindings are getters once compiled.
const HOURS_PER_WEEK = layout.HOURS_PER_WEEK;

/**
 * Each load's amp-hours over the first week, from the hours its kind ran (ranHours: DC driving, DC
 * parked, AC driving, AC parked, each per hour of the week, then the same weighted by the battery's
 * share of the demand), its schedule and Peukert's factor at its running current.
 */
export function perLoadAmpHours(demand: DemandProfile, ranHours: number[], ratedA: number, k: number): number[] {
  const perLoadAh = zeros(demand.loads.length);
  // Per day, the hours each kind ran (for the loads spread over the day).
  const byDay = zeros(8 * 7);
  for (let kind = 0; kind < 8; kind++) {
    for (let day = 0; day < 7; day++) {
      let sum = 0;
      for (let h = kind * HOURS_PER_WEEK + day * 24, end = h + 24; h < end; h++) sum += ranHours[h];
      byDay[kind * 7 + day] = sum;
    }
  }
  for (let i = 0; i < demand.loads.length; i++) {
    const lp = demand.loads[i];
    if (lp.hoursPerDay <= 0) continue;
    const x = peukertFactor(lp.runningA, ratedA, k) - 1;
    const d = lp.ac ? 2 : 0;
    const useD = lp.onDriving ? 1 : 0;
    const useP = lp.onParked ? 1 : 0;
    let sum = 0;
    let shared = 0;
    if (lp.startHour < 0) {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        sum += useD * byDay[d * 7 + day] + useP * byDay[(d + 1) * 7 + day];
        shared += useD * byDay[(d + 4) * 7 + day] + useP * byDay[(d + 5) * 7 + day];
      }
      sum *= lp.hoursPerDay / 24;
      shared *= lp.hoursPerDay / 24;
    } else {
      for (let day = 0; day < 7; day++) {
        if ((lp.days & (1 << day)) === 0) continue;
        let t = day * 24 + lp.startHour;
        let left = lp.hoursPerDay;
        while (left > 1e-12) {
          const y = left < 1 ? left : 1;
          const h = t % HOURS_PER_WEEK;
          sum += y * (useD * ranHours[d * HOURS_PER_WEEK + h] + useP * ranHours[(d + 1) * HOURS_PER_WEEK + h]);
          shared += y * (useD * ranHours[(d + 4) * HOURS_PER_WEEK + h] + useP * ranHours[(d + 5) * HOURS_PER_WEEK + h]);
          left -= y;
          t++;
        }
      }
    }
    perLoadAh[i] = lp.amps * (sum + x * shared);
  }
  return perLoadAh;
}
