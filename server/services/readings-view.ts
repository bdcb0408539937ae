// The Readings screen's answer, read as aggregates only: the chart averaged in the database into at most
// CHART_POINTS points, the record summed by the hour for the drain, and the model's line over the same
// hours, aligned to the local hours its schedule describes.
import type { Db } from '@/db/client';
import { project } from '@/shared/energy/project';
import { analyzeSummary, READING_RULES, socFromRestingVoltage, trickleA, usableCapacityAh } from '@/shared/energy/readings';
import { compareWithModel } from '@/shared/energy/readings-compare';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { CHART_POINTS } from '@/shared/schemas/reading';
import { localParts } from '../jobs/schedule';
import type { RigAccess } from '../middleware/rig-access';
import { chartBuckets, firstKnownCharge, flaggedRestedCount, hourlySummary, readingStats, restedRuns, spotReadings, uploadsOf } from '../repositories/readings';
import { loadsOfRigs } from '../repositories/rigs';
import type { Storage } from '../storage';
import { loadFromRow, modelInput } from './rigs-model';

const H = 3_600_000;
/** A view covers at most the model's longest horizon: the last 60 days of the record. */
const VIEW_DAYS = 60;
const iso = (d: unknown) => new Date(d as Date).toISOString();

type RowError = { line: number; reason: string };

export async function readingsOf(db: Db, storage: Storage, rig: RigAccess, viewer: { id: string }, timeZone: string) {
  const power = rigPowerSchema.parse(rig.power);
  const battery = power.battery;
  const usableAh = usableCapacityAh(battery);
  const trickle = trickleA(battery.capacityAh);
  const mayDelete = (createdBy: string | null) => rig.role === 'owner' || createdBy === viewer.id;
  const [stats, spot, uploads, loadRows] = await Promise.all([readingStats(db, rig.id), spotReadings(db, rig.id), uploadsOf(db, rig.id), loadsOfRigs(db, [rig.id])]);
  const loads = loadRows.map(loadFromRow);

  let view: Awaited<ReturnType<typeof viewOf>> | null = null;
  if (stats.first && stats.last) {
    const to = stats.last;
    const from = new Date(Math.max(stats.first.getTime(), to.getTime() - VIEW_DAYS * 24 * H));
    view = await viewOf(db, rig.id, { from, to, trickleA: trickle, timeZone });
  }
  const analysis = analyzeSummary({ chemistry: battery.chemistry, capacityAh: battery.capacityAh, usableAh, systemVoltage: power.systemVoltage }, view?.summary ?? { hourly: [], restedRuns: [], flaggedRested: 0 });

  // The model, parked, from the first reading whose charge is known (else from full, for the comparison only),
  // starting at the local hour that reading falls in: its point i is the end of hour i of the schedule.
  let model: { at: string; socPercent: number }[] = [];
  let comparison = null;
  if (view) {
    const known = view.firstKnown;
    const startAt = known?.at ?? view.from;
    const startSoc = known?.socPercent ?? 100;
    const local = localParts(startAt, timeZone);
    const hourStart = startAt.getTime() - local.minute * 60_000 - local.second * 1000 - startAt.getUTCMilliseconds();
    const hours = Math.min(VIEW_DAYS * 24, Math.max(1, Math.ceil((view.to.getTime() - hourStart) / H)));
    const run = project(modelInput({ ...power, battery: { ...battery, startSocPercent: startSoc }, horizonDays: Math.ceil(hours / 24), start: { weekday: local.weekday, hour: local.hour } }, loads), { fixes: false });
    const soc = run.series.slice(0, hours).map((s) => s.parkedSocPercent);
    if (known) model = [{ at: startAt.toISOString(), socPercent: startSoc }, ...soc.map((s, i) => ({ at: new Date(hourStart + (i + 1) * H).toISOString(), socPercent: s }))];
    const ampsAt = (t: number) => {
      const i = Math.round((t - hourStart) / H);
      if (i < 0 || i >= soc.length) return null;
      return (((i === 0 ? startSoc : soc[i - 1]) - soc[i]) / 100) * usableAh;
    };
    comparison = compareWithModel(analysis, ampsAt, power.keyOffDrawA);
  }

  const photos = await Promise.all(
    uploads
      .filter((u) => u.kind === 'photo')
      .map(async (u) => ({ id: u.id, caption: u.caption, fileName: u.file_name, by: u.by, createdAt: iso(u.created_at), canDelete: mayDelete(u.created_by), thumbUrl: (await storage.signedUrl(u.thumb_key ?? u.object_key)).url })),
  );
  const { spans: _spans, ...shown } = analysis;
  return {
    timeZone,
    total: stats.total,
    window: view ? { from: view.from.toISOString(), to: view.to.toISOString(), days: VIEW_DAYS, clipped: view.from.getTime() > stats.first!.getTime() } : null,
    chart: { points: view?.points ?? [], model },
    spot: spot.map((r) => ({ id: r.id, at: iso(r.at), voltageV: r.voltage_v, currentA: r.current_a, socPercent: r.soc_percent ?? (r.rested && (r.current_a === null || Math.abs(r.current_a) <= trickle) ? socFromRestingVoltage(battery.chemistry, r.voltage_v, power.systemVoltage).socPercent : null), rested: r.rested, place: r.place, note: r.note, by: r.by, canDelete: mayDelete(r.created_by) })),
    uploads: uploads.filter((u) => u.kind === 'log').map((u) => ({ id: u.id, fileName: u.file_name, rowCount: u.row_count, errorCount: u.error_count, errors: (u.errors as RowError[] | null)?.slice(0, 20) ?? [], by: u.by, createdAt: iso(u.created_at), canDelete: mayDelete(u.created_by) })),
    photos,
    analysis: { ...shown, comparison, quietHoursNeeded: READING_RULES.quietHoursNeeded, keyOffDrawA: power.keyOffDrawA, chemistry: battery.chemistry },
  };

  async function viewOf(db: Db, rigId: string, w: { from: Date; to: Date; trickleA: number; timeZone: string }) {
    const [buckets, hourly, runs, flagged, first] = await Promise.all([
      chartBuckets(db, rigId, { ...w, points: CHART_POINTS }),
      hourlySummary(db, rigId, { ...w, maxGapHours: READING_RULES.maxGapHours }),
      restedRuns(db, rigId, w),
      flaggedRestedCount(db, rigId, w),
      firstKnownCharge(db, rigId, w),
    ]);
    // A monitor's figure first, else a rested voltage (lead-acid): the earlier of the two.
    const firstKnown = first
      .map((r) => ({ at: r.at, socPercent: r.socPercent ?? socFromRestingVoltage(battery.chemistry, r.voltageV, power.systemVoltage).socPercent }))
      .filter((r): r is { at: Date; socPercent: number } => r.socPercent !== null)
      .sort((a, b) => a.at.getTime() - b.at.getTime())[0];
    const points = buckets.map((b) => ({
      at: new Date(Math.round(b.t)).toISOString(),
      n: b.n,
      voltageV: Math.round(b.v * 1000) / 1000,
      currentA: b.c === null ? null : Math.round(b.c * 1000) / 1000,
      socPercent: b.s !== null ? Math.round(b.s * 10) / 10 : b.vr !== null ? socFromRestingVoltage(battery.chemistry, b.vr, power.systemVoltage).socPercent : null,
    }));
    return { from: w.from, to: w.to, points, summary: { hourly, restedRuns: runs, flaggedRested: flagged }, firstKnown };
  }
}
