import { isDeepStrictEqual } from 'node:util';

import type { Db } from '@/db/client';
import { FIX_NAMES } from '@/shared/control-labels';
import { type FixKind, type Projection, project } from '@/shared/energy/project';
import { type Load, type RigPower, rigPowerSchema } from '@/shared/schemas/projection';
import { HttpError } from '../errors';
import type { RigAccess } from '../middleware/rig-access';
import { findHistoryEntry, insertHistory, markUndone } from '../repositories/history';
import { updateRigIfVersion } from '../repositories/rigs';
import { type Actor, daysParkedOf } from './history';
import { rigChanged, type WriteCtx } from './rig-changed';
import { readRig } from './rigs';
import { modelInput, stripLoad } from './rigs-model';

/** A Fix's change merged into the power system, section by section ({ inverter: { control } } and so on). */
function withChange(power: RigPower, change: Record<string, unknown>): RigPower {
  const next: Record<string, unknown> = { ...power };
  for (const [key, value] of Object.entries(change)) {
    const current = next[key];
    next[key] = value && typeof value === 'object' && current && typeof current === 'object' ? { ...current, ...value } : value;
  }
  return rigPowerSchema.parse(next);
}

const side = (p: Projection) => ({
  daysParked: p.parked.daysToCutoff,
  daysOnRoutine: p.routine.daysToCutoff,
  routineHolds: p.routine.holds,
  dailyAh: p.daily.consumptionAh,
  netAh: p.daily.netAh,
  marginDays: p.margin.days,
  marginState: p.margin.state,
});

/** The rig now and with one of its current Fixes: the figures before and after, and the power system it would save. */
async function planFix(db: Db, rig: RigAccess, kind: FixKind) {
  const dto = await readRig(db, rig);
  const loads: Load[] = dto.loads.map(stripLoad);
  const before = project(modelInput(dto.power, loads));
  const fix = before.fixes.find((f) => f.kind === kind);
  if (!fix) throw new HttpError(404, 'not_found', 'This Fix is not among the rig\'s Fixes now: it gains no days, or the rig has changed.', [{ path: 'kind', message: 'Not a current Fix of this rig.' }]);
  const power = withChange(dto.power, fix.change);
  const after = project(modelInput(power, loads), { fixes: false });
  return { dto, loads, fix, power, before: side(before), after: side(after), warnings: after.warnings };
}

export async function previewFix(db: Db, rig: RigAccess, kind: FixKind) {
  const { fix, before, after, warnings } = await planFix(db, rig, kind);
  return { kind, summary: fix.summary, convenience: fix.convenience, change: fix.change, before, after, warnings };
}

/** Applies a Fix: the new power system and its history entry in one transaction, against the version the owner saw. */
export async function applyFix(ctx: WriteCtx, rig: RigAccess, actor: Actor, kind: FixKind, version: number) {
  const { db } = ctx;
  const { dto, loads, fix, power } = await planFix(db, rig, kind);
  const applied = await db.transaction().execute(async (trx) => {
    const updated = await updateRigIfVersion(trx, rig.id, version, { power });
    if (!updated) throw new HttpError(409, 'conflict', 'Someone changed this rig since you opened it. Reload, then apply the Fix again.', [{ path: 'version', message: `This rig is now at version ${rig.version}.` }]);
    await insertHistory(trx, {
      rigId: rig.id,
      actor,
      kind: 'fix',
      summary: `applied the Fix “${FIX_NAMES[kind]}”: ${fix.summary}`,
      daysParkedBefore: daysParkedOf(dto.power, loads),
      daysParkedAfter: daysParkedOf(power, loads),
      undo: { before: dto.power, after: power },
    });
    return updated;
  });
  rigChanged(ctx, rig.id);
  return applied;
}

/** Undoes an applied Fix, once, while the power system is still as the Fix left it. */
export async function undoFix(ctx: WriteCtx, rig: RigAccess, actor: Actor, entryId: string) {
  const { db } = ctx;
  const entry = await findHistoryEntry(db, rig.id, entryId);
  if (!entry) throw new HttpError(404, 'not_found', 'No such history entry on this rig.');
  if (!entry.undo || entry.undone_at) throw new HttpError(409, 'conflict', entry.undo ? 'This Fix has already been undone.' : 'Only an applied Fix can be undone from History.');
  const now = rigPowerSchema.parse(rig.power);
  const after = rigPowerSchema.parse(entry.undo.after);
  const before = rigPowerSchema.parse(entry.undo.before);
  if (!isDeepStrictEqual(now, after)) {
    throw new HttpError(409, 'conflict', 'The power system has changed since this Fix was applied: change it back under Power instead.');
  }
  const loads = (await readRig(db, rig)).loads.map(stripLoad);
  const undone = await db.transaction().execute(async (trx) => {
    if (!(await markUndone(trx, entry.id))) throw new HttpError(409, 'conflict', 'This Fix has already been undone.');
    const updated = await updateRigIfVersion(trx, rig.id, rig.version, { power: before });
    if (!updated) throw new HttpError(409, 'conflict', 'Someone changed this rig a moment ago. Reload and try again.');
    await insertHistory(trx, {
      rigId: rig.id,
      actor,
      kind: 'fix',
      summary: `undid: ${entry.summary}`,
      daysParkedBefore: daysParkedOf(now, loads),
      daysParkedAfter: daysParkedOf(before, loads),
    });
    return updated;
  });
  rigChanged(ctx, rig.id);
  return undone;
}
