import type { Db } from '@/db/client';
import type { HistoryKind } from '@/db/schema';
import { project } from '@/shared/energy/project';
import { CABLE_TYPES, type CableRunInput, CIRCUIT_ROUTES } from '@/shared/schemas/cable-run';
import type { Load, RigPower } from '@/shared/schemas/projection';
import { routineOf as namedRoutine } from '@/shared/routines';
import { insertHistory, listHistory } from '../repositories/history';
import { loadsOfRigs, rigsOfHousehold } from '../repositories/rigs';
import { loadFromRow, modelInput } from './rigs-model';

export type Actor = { id: string; name: string };

/** Days parked of a power system and its loads (candidates left out, as in the Outlook); null when it holds. */
export function daysParkedOf(power: RigPower, loads: Load[]): number | null {
  try {
    return project(modelInput(power, loads), { fixes: false }).parked.daysToCutoff;
  } catch {
    return null;
  }
}

const power = (l: Load) => (l.amps !== undefined ? `${l.amps} A` : `${l.watts} W`);
export const describeLoad = (l: Load) => `${l.name} (${power(l)}${l.supply === 'ac' ? ' AC' : ''}, ${l.hoursPerDay} h a day${l.dutyPercent < 100 ? ` at ${l.dutyPercent} %` : ''}${l.status === 'candidate' ? ', candidate' : ''})`;

/** What changed in a load, in words: "Fridge: 45 W → 60 W, 24 h → 20 h a day". */
export function describeLoadEdit(before: Load, after: Load): string {
  const parts: string[] = [];
  if (before.name !== after.name) parts.push(`renamed to ${after.name}`);
  if (power(before) !== power(after)) parts.push(`${power(before)} → ${power(after)}`);
  if (before.hoursPerDay !== after.hoursPerDay) parts.push(`${before.hoursPerDay} h → ${after.hoursPerDay} h a day`);
  if (before.dutyPercent !== after.dutyPercent) parts.push(`duty ${before.dutyPercent} % → ${after.dutyPercent} %`);
  if (before.supply !== after.supply) parts.push(`now ${after.supply.toUpperCase()}`);
  if (before.when !== after.when) parts.push(`runs ${after.when}`);
  if (before.status !== after.status) parts.push(after.status === 'installed' ? 'adopted (installed)' : 'back to candidate');
  if (before.quantity !== after.quantity) parts.push(`quantity ${before.quantity} → ${after.quantity}`);
  if ((before.startHour ?? null) !== (after.startHour ?? null) || JSON.stringify(before.weekdays ?? null) !== JSON.stringify(after.weekdays ?? null)) parts.push('new schedule');
  return `${before.name}: ${parts.length ? parts.join(', ') : 'saved without changes'}`;
}

/** A new rig in a few words: "Wren (100 Ah AGM, 300 W inverter, 3 loads, routine: On the move)". */
export function describeNewRig(input: { name: string; power: RigPower; loads: Load[] }): string {
  const b = input.power.battery;
  const parts = [`${b.capacityAh} Ah ${b.chemistry === 'lifepo4' ? 'LiFePO4' : b.chemistry.toUpperCase()}`, input.power.inverter ? `${input.power.inverter.ratedW} W inverter` : 'no inverter', `${input.loads.length} load${input.loads.length === 1 ? '' : 's'}`, `routine: ${namedRoutine(input.power.charging).name}`];
  return `${input.name} (${parts.join(', ')})`;
}

/** What changed in a cable run, in words: "Fridge feed: 3 m → 4 m, 5 A → 6 A". */
type RunWords = Pick<CableRunInput, 'label' | 'from' | 'to' | 'lengthM' | 'currentA' | 'loadId' | 'maxDropPercent'> & Partial<Pick<CableRunInput, 'route' | 'cableType'>>;

export const describeCableRun = (r: RunWords) => `${r.label} (${r.from} → ${r.to || 'device'}, ${r.lengthM} m${r.currentA !== undefined ? `, ${r.currentA} A` : ''})`;

export function describeCableRunEdit(before: RunWords, after: RunWords): string {
  const parts: string[] = [];
  if (before.label !== after.label) parts.push(`renamed to ${after.label}`);
  if (before.lengthM !== after.lengthM) parts.push(`${before.lengthM} m → ${after.lengthM} m`);
  if ((before.currentA ?? null) !== (after.currentA ?? null) || (before.loadId ?? null) !== (after.loadId ?? null)) parts.push(after.currentA !== undefined ? `now ${after.currentA} A` : 'now follows its load');
  if (before.to !== after.to || before.from !== after.from) parts.push(`${after.from} → ${after.to}`);
  if (before.maxDropPercent !== after.maxDropPercent) parts.push(`drop allowed ${before.maxDropPercent} % → ${after.maxDropPercent} %`);
  if (before.route !== after.route && after.route) parts.push(`now runs ${CIRCUIT_ROUTES[after.route].label.toLowerCase()}`);
  if (before.cableType !== after.cableType && after.cableType) parts.push(`now in ${CABLE_TYPES[after.cableType].label}, ${CABLE_TYPES[after.cableType].insulationC} °C`);
  return `${before.label}: ${parts.length ? parts.join(', ') : 'saved without size-changing edits'}`;
}

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
const routineOf = (p: RigPower) => ({ minutes: p.charging.drivingMinutesPerDay, start: p.charging.drivingStartHour });
const chargingOf = (p: RigPower) => ({ ...p.charging, drivingMinutesPerDay: undefined, drivingStartHour: undefined });

/** The sections of the power system a change touched, each in a few words, first one naming the entry's kind. */
export function describePowerChange(before: RigPower, after: RigPower): { kind: HistoryKind; summary: string } | null {
  const parts: { kind: HistoryKind; text: string }[] = [];
  if (!same(before.battery, after.battery) || before.systemVoltage !== after.systemVoltage || before.keyOffDrawA !== after.keyOffDrawA) {
    const b = before.battery;
    const a = after.battery;
    const bits: string[] = [];
    if (b.capacityAh !== a.capacityAh) bits.push(`${b.capacityAh} Ah → ${a.capacityAh} Ah`);
    if (b.chemistry !== a.chemistry) bits.push(`${b.chemistry} → ${a.chemistry}`);
    if (b.healthPercent !== a.healthPercent) bits.push(`health ${b.healthPercent} % → ${a.healthPercent} %`);
    if (b.temperatureC !== a.temperatureC) bits.push(`${b.temperatureC} °C → ${a.temperatureC} °C`);
    if (before.keyOffDrawA !== after.keyOffDrawA) bits.push(`key-off draw ${before.keyOffDrawA} A → ${after.keyOffDrawA} A`);
    parts.push({ kind: 'battery', text: `battery${bits.length ? ` (${bits.join(', ')})` : ''}` });
  }
  if (!same(before.inverter, after.inverter)) {
    const b = before.inverter;
    const a = after.inverter;
    const text = !a ? 'inverter removed' : !b ? `inverter added (${a.ratedW} W, ${a.idleA} A idle)` : `inverter (${b.control === a.control ? `${a.ratedW} W, ${a.idleA} A idle` : `${b.control} → ${a.control}`})`;
    parts.push({ kind: 'inverter', text });
  }
  if (!same(chargingOf(before), chargingOf(after))) parts.push({ kind: 'charging', text: 'charging' });
  if (!same(routineOf(before), routineOf(after))) {
    const total = (p: RigPower) => p.charging.drivingMinutesPerDay.reduce((s, m) => s + m, 0);
    parts.push({ kind: 'routine', text: `routine (${total(before)} → ${total(after)} min of driving a week)` });
  }
  if (before.plannedStayDays !== after.plannedStayDays || before.horizonDays !== after.horizonDays || !same(before.start, after.start)) {
    parts.push({ kind: 'stay', text: `planned stay ${before.plannedStayDays} → ${after.plannedStayDays} days` });
  }
  if (!parts.length) return null;
  return { kind: parts[0].kind, summary: `changed ${parts.map((p) => p.text).join('; ')}` };
}

/** A membership change, written on every rig of the household (the forecast does not move). */
export async function recordMembership(db: Db, householdId: string, actor: Actor | null, kind: HistoryKind, summary: string) {
  for (const rig of await rigsOfHousehold(db, householdId)) {
    const loads = (await loadsOfRigs(db, [rig.id])).map(loadFromRow);
    const days = daysParkedOf(rig.power as RigPower, loads);
    await insertHistory(db, { rigId: rig.id, actor, kind, summary, daysParkedBefore: days, daysParkedAfter: days });
  }
}

export async function historyOf(db: Db, rigId: string) {
  const rows = await listHistory(db, rigId);
  return rows.map((r) => ({
    id: r.id,
    at: new Date(r.created_at as unknown as Date).toISOString(),
    actor: { id: r.actor_id, name: r.actor_name },
    kind: r.kind,
    summary: r.summary,
    daysParkedBefore: r.days_parked_before,
    daysParkedAfter: r.days_parked_after,
    undoable: r.undo !== null && r.undone_at === null,
  }));
}
