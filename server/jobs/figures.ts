import type { Db } from '@/db/client';
import { type Fix, type FixKind, fixGainText, project } from '@/shared/energy/project';
import { rigPowerSchema } from '@/shared/schemas/projection';
import { loadsOfRigs } from '../repositories/rigs';
import { loadFromRow, modelInput } from '../services/rigs-model';
import { activeTripOutlook, activeTrips } from '../services/trip-model';
import type { Trip } from '@/shared/schemas/trip';

/** The Outlook's figures a report or a warning quotes: the same model run as GET /api/rigs/:rigId/outlook. */
export type RigFigures = {
  rigId: string;
  rigName: string;
  version: number;
  /** The rig's nominal voltage: watt-hours in an e-mail are amp-hours times this (shared/units.ts). */
  systemVoltage: number;
  daysParked: number | null;
  daysOnRoutine: number | null;
  holds: boolean;
  marginState: 'comfortable' | 'tight' | 'short';
  marginDays: number | null;
  plannedStayDays: number;
  horizonDays: number;
  standbySharePercent: number;
  drains: { name: string; kind: 'load' | 'standby'; ahPerDay: number; sharePercent: number }[];
  fixes: ({ kind: FixKind; summary: string; gain: string } & Pick<Fix, 'daysGainedParked' | 'daysGainedRoutine' | 'outlastsHorizon' | 'holds' | 'cutsEssential'>)[];
  /** The first week's state of charge, hour by hour from the starting charge, for the small chart. */
  weekSocPercent: number[];
  cutoffSocPercent: number;
  /** Hour of the week (Monday 00:00 = 0) of the chart's first point. */
  chartStartHourOfWeek: number;
  /** The active trip's stays: while one is active, the margin above is the trip's (its tightest stay). */
  trip: null | {
    name: string;
    stays: { name: string; arriveAt: string; leaveAt: string; socOnLeavingPercent: number; marginDays: number | null; marginState: 'comfortable' | 'tight' | 'short'; arrivesBelowCutoff: boolean }[];
  };
};

type RigRow = { id: string; name: string; version: number; power: unknown };

export function figuresOf(rig: RigRow, loads: ReturnType<typeof loadFromRow>[], activeTrip?: Trip & { id: string }): RigFigures {
  const power = rigPowerSchema.parse(rig.power);
  const input = modelInput(power, loads);
  const p = project(input);
  const trip = activeTripOutlook(input, activeTrip);
  const tightest = trip?.stays.find((s) => s.name === trip.tightestStay);
  const round1 = (x: number) => Math.round(x * 10) / 10;
  return {
    rigId: rig.id,
    rigName: rig.name,
    version: rig.version,
    systemVoltage: input.systemVoltage,
    daysParked: p.parked.daysToCutoff,
    daysOnRoutine: p.routine.daysToCutoff,
    holds: p.routine.holds,
    marginState: trip ? trip.marginState : p.margin.state,
    marginDays: tightest ? tightest.marginDays : p.margin.days,
    plannedStayDays: tightest ? tightest.nights : p.margin.plannedStayDays,
    horizonDays: p.horizonDays,
    standbySharePercent: Math.round(p.breakdown.filter((b) => b.kind === 'standby').reduce((s, b) => s + b.share, 0) * 100),
    drains: p.breakdown.slice(0, 4).map((b) => ({ name: b.name, kind: b.kind, ahPerDay: b.ahPerDay, sharePercent: Math.round(b.share * 100) })),
    fixes: (trip ? trip.fixes : p.fixes).slice(0, 3).map((f) => ({
      kind: f.kind,
      summary: f.summary,
      gain: fixGainText(f),
      daysGainedParked: f.daysGainedParked,
      daysGainedRoutine: f.daysGainedRoutine,
      outlastsHorizon: f.outlastsHorizon,
      holds: f.holds,
      cutsEssential: f.cutsEssential,
    })),
    // The first point is the starting charge, then one an hour.
    weekSocPercent: [round1(p.start.socPercent), ...p.series.slice(0, 168).map((s) => round1(s.socPercent))],
    cutoffSocPercent: p.cutoffSocPercent,
    chartStartHourOfWeek: p.start.weekday * 24 + p.start.hourOfDay,
    trip: trip
      ? {
          name: trip.name,
          stays: trip.stays.map((s) => ({ name: s.name, arriveAt: s.arriveAt, leaveAt: s.leaveAt, socOnLeavingPercent: s.socOnLeavingPercent, marginDays: s.marginDays, marginState: s.marginState, arrivesBelowCutoff: s.arrivesBelowCutoff })),
        }
      : null,
  };
}

export async function figuresOfRigs(db: Db, rigs: RigRow[]): Promise<Map<string, RigFigures>> {
  const out = new Map<string, RigFigures>();
  for (let i = 0; i < rigs.length; i += 500) {
    const chunk = rigs.slice(i, i + 500);
    const loads = await loadsOfRigs(db, chunk.map((r) => r.id));
    const trips = await activeTrips(db, chunk.map((r) => r.id));
    const byRig = new Map<string, ReturnType<typeof loadFromRow>[]>();
    for (const l of loads) {
      const list = byRig.get(l.rig_id) ?? [];
      list.push(loadFromRow(l));
      byRig.set(l.rig_id, list);
    }
    for (const rig of chunk) out.set(rig.id, figuresOf(rig, byRig.get(rig.id) ?? [], trips.get(rig.id)));
  }
  return out;
}

export const daysText = (days: number | null, horizonDays: number) => (days === null ? `more than ${horizonDays} days` : `${days.toFixed(1)} days`);
export const STATE_WORD = { comfortable: 'Comfortable', tight: 'Tight', short: 'Short' } as const;

/** One line per stay of the active trip: "The stay at Lake (5 to 10 June) ends Short: ...". */
export function tripLines(trip: NonNullable<RigFigures['trip']>): string[] {
  const day = (at: string) => new Date(`${at.slice(0, 10)}T12:00:00Z`).toLocaleDateString('en-GB', { day: 'numeric', month: 'long', timeZone: 'UTC' });
  return trip.stays.map((s) => {
    const margin = s.arrivesBelowCutoff
      ? 'arriving below the cut-off'
      : s.marginDays === null
        ? 'the battery outlasts it' : s.marginDays < 0 ? `the cut-off comes ${Math.abs(s.marginDays).toFixed(1)} days before leaving` : `${s.marginDays.toFixed(1)} days to spare`;
    return `The stay at ${s.name} (${day(s.arriveAt)} to ${day(s.leaveAt)}) ends ${STATE_WORD[s.marginState]}: ${s.socOnLeavingPercent.toFixed(0)} % on leaving, ${margin}.`;
  });
}
