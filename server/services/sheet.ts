import type { Db } from '@/db/client';
import { explainAssumptions } from '@/shared/energy/assumptions';
import { project } from '@/shared/energy/project';
import { routineOf } from '@/shared/routines';
import type { EnergyUnit } from '@/shared/units';
import type { RigAccess } from '../middleware/rig-access';
import { svgToPng, weekChartSvg } from '../emails/chart';
import { renderSheet, type SheetData, type SheetSize } from '../sheet/render';
import { modelInput, stripLoad } from './rigs-model';
import { rigHookup } from './hookup';
import { readRig } from './rigs';

/** The inverter's hook-up plan as lines for the sheet (as the Hook-up tab shows it), or null without an inverter. */
async function hookUpPlanOf(db: Db, rig: RigAccess, hasInverter: boolean): Promise<string[] | null> {
  if (!hasInverter) return null;
  const plan = await rigHookup(db, rig, {});
  const f = plan.feed;
  const size = f.awg ? `${f.awg} AWG${f.mm2 ? ` (${f.mm2} mm²)` : ''}` : f.mm2 ? `${f.mm2} mm²` : null;
  return [
    `Feed: ${f.currentA} A at full output near the ${f.cutOutV} V cut-out, ${f.continuousA} A continuous (125 %)${size ? `; ${size} over ${f.lengthM} m` : ''}${f.dropPercent !== null ? `, ${f.dropPercent} % drop` : ''}${f.fuseA ? `; protection ${f.fuseA} A` : ''}.`,
    ...plan.parts.map((p) => `${p.label}${p.ratingA !== null ? ` (${p.ratingA} A)` : ''}${p.notes.length ? `: ${p.notes.join(' ')}` : ''}`),
    ...plan.warnings.map((w) => `Warning: ${w.message}`),
    "The inverter maker's own fuse and cable instructions come first.",
  ];
}

/** The budget sheet of a rig as a PDF: the same model run as the Outlook, laid out for print, its energy in the reader's unit. */
export async function budgetSheet(db: Db, rig: RigAccess, size: SheetSize, energy: EnergyUnit, now = new Date()): Promise<{ pdf: Buffer; filename: string }> {
  const dto = await readRig(db, rig);
  const input = modelInput(dto.power, dto.loads);
  const p = project(input);
  const first = p.series[0];
  const chartPng = p.series.length
    ? svgToPng(
        weekChartSvg(
          p.series.map((s) => s.socPercent),
          p.cutoffSocPercent,
          first.weekday * 24 + first.hourOfDay,
          p.series.map((s) => s.parkedSocPercent),
        ),
        1400,
      )
    : null;
  const byName = new Map(p.breakdown.map((b) => [b.name, b]));
  const data: SheetData = {
    rig: { name: dto.name, vehicle: dto.vehicle, household: dto.householdName, version: dto.version },
    power: dto.power,
    routine: routineOf(dto.power.charging),
    loads: dto.loads.map(stripLoad).map((l) => ({ load: l, ahPerDay: l.status === 'installed' ? (byName.get(l.name)?.ahPerDay ?? 0) : null, share: l.status === 'installed' ? (byName.get(l.name)?.share ?? 0) : null })),
    projection: p,
    assumptions: explainAssumptions(dto.power, p.assumptions, p.horizonDays),
    chartPng,
    hookUp: await hookUpPlanOf(db, rig, dto.power.inverter !== null),
    energy,
    madeAt: now,
  };
  const pdf = await renderSheet(data, size);
  const slug = dto.name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'rig';
  return { pdf, filename: `${slug}-budget-sheet.pdf` };
}
