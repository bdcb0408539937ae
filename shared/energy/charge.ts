// The battery's charge acceptance over time, in closed form (see docs/model.md, "How a run works").

/**
 * Charge stored in dt hours from a surplus current S (A) at the battery, from ah: the acceptance is bulkA
 * below the taper start and falls linearly to floorA at full, times the charge efficiency e. The linear
 * taper has a closed form (the acceptance decays exponentially once it is below the surplus), so the
 * answer does not depend on the step.
 */
export function chargeFor(ah: number, S: number, dt: number, e: number, bulkA: number, floorA: number, tsAh: number, full: number): number {
  if (S <= 0 || dt <= 0 || ah >= full) return ah >= full ? full : ah;
  const span = full - tsAh;
  const slope = span > 1e-9 ? (bulkA - floorA) / span : 0;
  // Below the taper: at e × min(S, bulk) until the taper starts.
  if (ah < tsAh) {
    const rate = e * (S < bulkA ? S : bulkA);
    const t1 = (tsAh - ah) / rate;
    if (t1 >= dt) return ah + rate * dt;
    ah = tsAh;
    dt -= t1;
  }
  if (slope <= 0) {
    const rate = e * (S < bulkA ? S : bulkA);
    return Math.min(full, ah + rate * dt);
  }
  // In the taper with the surplus below the acceptance: linear at e × S until they meet.
  let u = bulkA - slope * (ah - tsAh);
  if (S < u) {
    const meet = S > floorA ? tsAh + (bulkA - S) / slope : full;
    const t2 = (meet - ah) / (e * S);
    if (t2 >= dt) return Math.min(full, ah + e * S * dt);
    if (meet >= full) return full;
    ah = meet;
    dt -= t2;
    u = S;
  }
  // The acceptance u decays as du/dt = −slope × e × u until it reaches the floor (full).
  const rate = slope * e;
  const toFull = Math.log(u / floorA) / rate;
  if (dt >= toFull) return full;
  u *= Math.exp(-rate * dt);
  return Math.min(full, tsAh + (bulkA - u) / slope);
}

/**
 * How long (at most dt) charging from ah at a surplus S takes to reach target, self-discharge included:
 * bisection on the closed-form charge, which rises with time. A module-level function so that the hot
 * loop's variables stay off the heap (a closure there would capture them).
 */
export function timeToReach(target: number, ah: number, S: number, dt: number, e: number, bulkA: number, floorA: number, tsAh: number, full: number, selfA: number): number {
  if (chargeFor(ah, S, dt, e, bulkA, floorA, tsAh, full) - selfA * dt < target) return dt;
  let lo = 0;
  let hi = dt;
  for (let i = 0; i < 40; i++) {
    const mid = (lo + hi) / 2;
    if (chargeFor(ah, S, mid, e, bulkA, floorA, tsAh, full) - selfA * mid >= target) hi = mid;
    else lo = mid;
  }
  return hi;
}
