import type { Db } from '@/db/client';
import type { CableRunTable, HistoryKind } from '@/db/schema';
import type { Selectable } from 'kysely';
import { loadRunningCurrentA } from '@/shared/energy/profile';
import { fittedWireWarnings, inverterFeedCurrentA, NoConductorError, sizeCableRun } from '@/shared/energy/wiring';
import { MAINS_WIRING_WARNING } from '@/shared/safety';
import type { CableRunInput } from '@/shared/schemas/cable-run';
import { CABLE_TYPES, cableRunSizeSchema, CIRCUIT_ROUTES } from '@/shared/schemas/cable-run';
import { HttpError } from '../errors';
import { deleteCableRun, insertCableRun, listCableRuns, updateCableRun } from '../repositories/cable-runs';
import type { RigAccess } from '../middleware/rig-access';
import { readRig } from './rigs';
import { stripLoad } from './rigs-model';
import { type Actor, daysParkedOf, describeCableRun, describeCableRunEdit } from './history';
import { insertHistory } from '../repositories/history';
import { rigChanged, type WriteCtx } from './rig-changed';

type Row = Selectable<CableRunTable>;

function toRow(run: CableRunInput) {
  return {
    label: run.label,
    from_point: run.from,
    to_point: run.to,
    length_m: run.lengthM,
    current_a: run.currentA ?? null,
    load_id: run.loadId ?? null,
    inverter_link: run.inverterLink,
    max_drop_percent: run.maxDropPercent,
    route: run.route,
    cable_type: run.cableType,
    insulation_c: CABLE_TYPES[run.cableType].insulationC,
    engine_space: CIRCUIT_ROUTES[run.route].engineSpace,
    return_path: run.returnPath,
    continuous: run.continuous,
    purpose: run.purpose,
    existing_awg: run.existingAwg ?? null,
    existing_mm2: run.existingMm2 ?? null,
  };
}

/** Every saved run of a rig with its size, drop and protection, and a warning where the fitted wire is too small. */
export async function cableRunsOf(db: Db, rig: RigAccess) {
  const dto = await readRig(db, rig);
  const rows = await listCableRuns(db, rig.id);
  return rows.map((row) => describe(row, dto.power, dto.loads));
}

type Power = Awaited<ReturnType<typeof readRig>>['power'];

function describe(row: Row, power: Power, loads: Awaited<ReturnType<typeof readRig>>['loads']) {
  const V = power.systemVoltage;
  const inverter = power.inverter;
  const eff = (inverter?.efficiencyPercent ?? 90) / 100;
  const load = row.load_id ? loads.find((l) => l.id === row.load_id) : undefined;
  const fromInverter = row.current_a === null && row.inverter_link;
  const currentA = row.current_a ?? (fromInverter ? (inverter ? inverterFeedCurrentA(inverter.ratedW, V, inverter.efficiencyPercent) : 0) : load ? loadRunningCurrentA(load, V, eff) : 0);
  const base = {
    id: row.id,
    label: row.label,
    from: row.from_point,
    to: row.to_point,
    lengthM: row.length_m,
    currentA: Math.round(currentA * 100) / 100,
    currentFrom: row.current_a !== null ? ('entered' as const) : fromInverter ? ('inverter' as const) : load ? ('load' as const) : ('missing' as const),
    loadId: row.load_id,
    inverterLink: row.inverter_link,
    loadName: load?.name ?? null,
    maxDropPercent: row.max_drop_percent,
    route: row.route,
    cableType: row.cable_type,
    insulationC: row.insulation_c,
    engineSpace: row.engine_space,
    returnPath: row.return_path,
    continuous: row.continuous,
    purpose: row.purpose,
    existingAwg: row.existing_awg,
    existingMm2: row.existing_mm2,
  };
  if (fromInverter && !inverter) return { ...base, sizing: null, warnings: ['The rig has no inverter: add one on the Power screen, or give the run its current.'] };
  if (!fromInverter && row.current_a === null && load?.supply === 'ac') return { ...base, sizing: null, warnings: [MAINS_WIRING_WARNING] };
  if (currentA <= 0) return { ...base, sizing: null, warnings: ['The linked load was deleted: give the run its current.'] };
  const input = cableRunSizeSchema.parse({
    systemVoltage: V,
    ...(fromInverter ? { inverterW: inverter!.ratedW, inverterEfficiencyPercent: inverter!.efficiencyPercent } : { currentA }),
    lengthM: row.length_m,
    maxDropPercent: row.max_drop_percent,
    route: row.route,
    cableType: row.cable_type,
    insulationC: row.insulation_c,
    engineSpace: row.engine_space,
    returnPath: row.return_path,
    continuous: row.continuous,
    purpose: fromInverter ? 'inverter' : row.purpose,
  });
  try {
    const sizing = sizeCableRun(input);
    const warnings = fittedWireWarnings(sizing, row.existing_awg, row.existing_mm2);
    return { ...base, sizing, warnings };
  } catch (err) {
    if (err instanceof NoConductorError) return { ...base, sizing: null, warnings: [err.message] };
    throw err;
  }
}

async function checkLoad(db: Db, rig: RigAccess, run: CableRunInput) {
  if (!run.loadId) return;
  const dto = await readRig(db, rig);
  if (!dto.loads.some((l) => l.id === run.loadId)) throw new HttpError(400, 'validation_failed', 'That load is not on this rig.', [{ path: 'loadId', message: 'Choose one of this rig\'s loads.' }]);
}

const wordsOf = (row: Row) => ({ label: row.label, from: row.from_point, to: row.to_point, lengthM: row.length_m, currentA: row.current_a ?? undefined, loadId: row.load_id ?? undefined, maxDropPercent: row.max_drop_percent, route: row.route, cableType: row.cable_type });

/** A History entry for a cable run (the forecast does not move: before and after are the same). */
async function record(db: Db, rig: RigAccess, actor: Actor, kind: HistoryKind, summary: string) {
  const dto = await readRig(db, rig);
  const days = daysParkedOf(dto.power, dto.loads.map(stripLoad));
  return (trx: Db) => insertHistory(trx, { rigId: rig.id, actor, kind, summary, daysParkedBefore: days, daysParkedAfter: days });
}

export async function addCableRun(ctx: WriteCtx, rig: RigAccess, actor: Actor, run: CableRunInput) {
  const { db } = ctx;
  await checkLoad(db, rig, run);
  const history = await record(db, rig, actor, 'cable-run-added', `added the cable run ${describeCableRun(run)}`);
  const row = await db.transaction().execute(async (trx) => {
    const saved = await insertCableRun(trx, rig.id, { ...toRow(run), created_by: actor.id });
    await history(trx);
    return saved;
  });
  rigChanged(ctx, rig.id);
  return (await cableRunsOf(db, rig)).find((r) => r.id === row.id)!;
}

export async function editCableRun(ctx: WriteCtx, rig: RigAccess, actor: Actor, runId: string, run: CableRunInput) {
  const { db } = ctx;
  await checkLoad(db, rig, run);
  const before = (await listCableRuns(db, rig.id)).find((r) => r.id === runId);
  if (!before) throw new HttpError(404, 'not_found', 'No such cable run on this rig.');
  const history = await record(db, rig, actor, 'cable-run-edited', `edited the cable run ${describeCableRunEdit(wordsOf(before), run)}`);
  const row = await db.transaction().execute(async (trx) => {
    const updated = await updateCableRun(trx, rig.id, runId, toRow(run));
    if (!updated) throw new HttpError(404, 'not_found', 'No such cable run on this rig.');
    await history(trx);
    return updated;
  });
  rigChanged(ctx, rig.id);
  return (await cableRunsOf(db, rig)).find((r) => r.id === row.id)!;
}

export async function removeCableRun(ctx: WriteCtx, rig: RigAccess, actor: Actor, runId: string) {
  const { db } = ctx;
  const before = (await listCableRuns(db, rig.id)).find((r) => r.id === runId);
  if (!before) throw new HttpError(404, 'not_found', 'No such cable run on this rig.');
  const history = await record(db, rig, actor, 'cable-run-removed', `removed the cable run ${describeCableRun(wordsOf(before))}`);
  await db.transaction().execute(async (trx) => {
    if (!(await deleteCableRun(trx, rig.id, runId))) throw new HttpError(404, 'not_found', 'No such cable run on this rig.');
    await history(trx);
  });
  rigChanged(ctx, rig.id);
}
