import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';

import { FIX_TITLES } from '@/shared/control-labels';
import type { Assumption } from '@/shared/energy/assumptions';
import type { Projection } from '@/shared/energy/project';
import { FIX_WIRING_CAUTION, GENERAL_CAUTIONS, needsWiringCaution } from '@/shared/safety';
import type { Load, RigPower } from '@/shared/schemas/projection';
import { colors } from '@/shared/theme';
import { energyAmount, type EnergyUnit, energyInText, formatEnergy } from '@/shared/units';

const require_ = createRequire(__filename);
const REGULAR = require_.resolve('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf');
const BOLD = require_.resolve('@expo-google-fonts/nunito/700Bold/Nunito_700Bold.ttf');

export type SheetSize = 'a4' | 'letter';
export type SheetData = {
  rig: { name: string; vehicle: string; household: string; version: number };
  power: RigPower;
  routine: { name: string; description: string };
  loads: { load: Load; ahPerDay: number | null; share: number | null }[];
  projection: Projection;
  assumptions: Assumption[];
  chartPng: Buffer | null;
  /** The hook-up plan's lines where the rig has one (see hookUpPlanOf in services/sheet.ts). */
  hookUp: string[] | null;
  /** The reader's energy unit: amp-hours, or watt-hours at the system voltage (shared/units.ts). */
  energy: EnergyUnit;
  madeAt: Date;
};

const STATE = { comfortable: 'Comfortable', tight: 'Tight', short: 'Short' } as const;
const days = (d: number | null, horizon: number) => (d === null ? `more than ${horizon} days` : `${d.toFixed(1)} days`);
const draw = (l: Load) => (l.amps !== undefined ? `${l.amps} A` : `${l.watts} W`);

/** Lays the sheet out on A4 or Letter with pdfkit, in the app's Nunito; answers the finished file. */
export function renderSheet(data: SheetData, size: SheetSize): Promise<Buffer> {
  const margin = 48;
  const doc = new PDFDocument({ size: size === 'a4' ? 'A4' : 'LETTER', margin, bufferPages: true, info: { Title: `${data.rig.name}: budget sheet`, Author: 'Keyoff', Subject: 'Electrical budget of a vehicle' } });
  doc.registerFont('regular', REGULAR);
  doc.registerFont('bold', BOLD);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const width = doc.page.width - 2 * margin;
  const bottom = () => doc.page.height - margin - 24;
  const room = (h: number) => {
    if (doc.y + h > bottom()) doc.addPage();
  };
  const heading = (text: string) => {
    room(60);
    doc.moveDown(0.8).font('bold').fontSize(14).fillColor(colors.night).text(text, margin, doc.y, { width });
    doc.moveDown(0.3);
  };
  const para = (text: string, opts: { size?: number; color?: string; bold?: boolean } = {}) => {
    doc.font(opts.bold ? 'bold' : 'regular').fontSize(opts.size ?? 10).fillColor(opts.color ?? colors.ink);
    room(doc.heightOfString(text, { width }));
    doc.text(text, margin, doc.y, { width });
  };
  /** A table: columns as fractions of the width; rows wrap inside their cells and move to a new page whole. */
  const table = (cols: { title: string; share: number; align?: 'left' | 'right' }[], rows: string[][]) => {
    const widths = cols.map((c) => c.share * width);
    const line = (cells: string[], bold: boolean) => {
      doc.font(bold ? 'bold' : 'regular').fontSize(9);
      const h = Math.max(...cells.map((c, i) => doc.heightOfString(c, { width: widths[i] - 6 }))) + 6;
      room(h);
      const y = doc.y;
      let x = margin;
      cells.forEach((c, i) => {
        doc.fillColor(colors.ink).text(c, x + 3, y + 3, { width: widths[i] - 6, align: cols[i].align ?? 'left' });
        x += widths[i];
      });
      doc.moveTo(margin, y + h).lineTo(margin + width, y + h).lineWidth(0.5).strokeColor(colors.line).stroke();
      doc.x = margin;
      doc.y = y + h;
    };
    line(cols.map((c) => c.title), true);
    rows.forEach((r) => line(r, false));
  };

  const { rig, projection: p } = data;
  const energy = (ah: number, digits = 1) => formatEnergy(ah, data.energy, data.power.systemVoltage, digits);
  const inText = (text: string) => energyInText(text, data.energy, data.power.systemVoltage);
  // Title and the headline figures.
  doc.font('bold').fontSize(22).fillColor(colors.night).text(`${rig.name}: budget sheet`, margin, margin, { width });
  para(`${rig.vehicle || 'Vehicle not given'} · ${rig.household} · version ${rig.version} · made ${data.madeAt.toISOString().slice(0, 16).replace('T', ' ')} UTC`, { color: colors.inkSoft });
  heading('Headline figures');
  table(
    [
      { title: 'Figure', share: 0.45 },
      { title: 'Value', share: 0.55 },
    ],
    [
      ['Days parked (to the cut-off, no driving)', days(p.parked.daysToCutoff, p.horizonDays)],
      ['Days on your routine', p.routine.holds ? 'Holds: the week puts back what it uses' : days(p.routine.daysToCutoff, p.horizonDays)],
      [`Margin for a ${p.margin.plannedStayDays}-day stay`, `${STATE[p.margin.state]}${p.margin.days === null ? ' (the cut-off is beyond the horizon)' : ` (${p.margin.days >= 0 ? '+' : ''}${p.margin.days.toFixed(1)} days)`}`],
      ['Routine', `${data.routine.name}: ${data.routine.description}`],
      ['A day', `${energy(p.daily.consumptionAh)} used, ${energy(p.daily.chargeAh)} put back`],
      ['Cut-off', `${p.cutoffSocPercent} % state of charge`],
    ],
  );

  if (data.chartPng) {
    heading(`State of charge over ${p.horizonDays} days`);
    const h = width * (200 / 560);
    room(h + 30);
    doc.image(data.chartPng, margin, doc.y, { width });
    doc.y += h + 4;
    para(`Dark line: on your routine. Dotted grey: parked, no driving. Red dashes: cut-off at ${p.cutoffSocPercent} %.`, { size: 8, color: colors.inkSoft });
  }

  heading('The rig');
  const pw = data.power;
  const b = pw.battery;
  const inv = pw.inverter;
  table(
    [
      { title: 'Part', share: 0.3 },
      { title: 'As modelled', share: 0.7 },
    ],
    [
      ['Battery', `${b.capacityAh} Ah ${b.chemistry === 'lifepo4' ? 'LiFePO4' : b.chemistry.toUpperCase()} ${b.role === 'starter' ? 'starting battery' : 'house battery'} at ${pw.systemVoltage} V, health ${b.healthPercent} %, ${b.temperatureC} °C`],
      ['Inverter', inv ? `${inv.ratedW} W, ${inv.idleA} A idle, ${inv.efficiencyPercent} % efficient, ${inv.control.replace(/-/g, ' ')}${inv.connection === 'socket' ? `, in a socket (${inv.socketFuseA} A fuse) ${inv.socketSwitched ? 'live with the ignition' : 'always live'}` : ''}` : 'None'],
      ['Key-off draw', `${pw.keyOffDrawA} A`],
      ['Charging', `${pw.charging.alternatorA} A from the alternator through ${pw.charging.charger === 'dc-dc' ? 'a DC-DC charger' : 'a relay'}${pw.charging.solarW ? `; ${pw.charging.solarW} W of solar` : ''}${pw.charging.shore?.amps ? `; shore power ${pw.charging.shore.amps} A` : ''}`],
    ],
  );

  heading('Loads');
  const installed = data.loads.filter((l) => l.load.status === 'installed');
  if (installed.length) {
    table(
      [
        { title: 'Load', share: 0.3 },
        { title: 'Supply', share: 0.1 },
        { title: 'Draw', share: 0.12, align: 'right' },
        { title: 'h/day', share: 0.1, align: 'right' },
        { title: 'Duty', share: 0.1, align: 'right' },
        { title: `${data.energy} a day`, share: 0.14, align: 'right' },
        { title: 'Share', share: 0.14, align: 'right' },
      ],
      installed.map(({ load, ahPerDay, share }) => [load.quantity > 1 ? `${load.name} ×${load.quantity}` : load.name, load.supply.toUpperCase(), draw(load), String(load.hoursPerDay), `${load.dutyPercent} %`, energyAmount(ahPerDay ?? 0, data.energy, data.power.systemVoltage, 2), `${Math.round((share ?? 0) * 100)} %`]),
    );
  } else para('No loads yet.');
  para(`Standby a day: inverter idle ${energy(p.standby.inverterIdleAh, 2)}, key-off draw ${energy(p.standby.keyOffAh, 2)}, self-discharge ${energy(p.standby.selfDischargeAh, 2)}.`, { size: 9, color: colors.inkSoft });
  const candidates = data.loads.filter((l) => l.load.status === 'candidate');
  if (candidates.length) para(`Candidates, not counted above: ${candidates.map((c) => `${c.load.name} (${draw(c.load)}, ${c.load.hoursPerDay} h a day)`).join('; ')}.`, { size: 9 });

  if (p.warnings.length) {
    heading('Warnings');
    p.warnings.forEach((w) => para(`▲ ${inText(w.message)}`, { color: colors.short }));
  }

  heading('Fixes');
  if (!p.fixes.length) para('Nothing to fix: no change gains days.');
  p.fixes.forEach((f) => {
    para(`${FIX_TITLES[f.kind] ?? f.kind}: ${f.holds ? 'the routine holds' : `+${f.daysGainedRoutine.toFixed(1)} days on your routine`}${f.daysGainedParked > 0 ? `, +${f.daysGainedParked.toFixed(1)} days parked` : ''}`, { bold: true });
    para(inText(`${f.summary} Cost in convenience: ${f.convenience}`), { size: 9 });
    doc.moveDown(0.3);
  });
  if (needsWiringCaution(p.fixes)) para(FIX_WIRING_CAUTION, { size: 9, color: colors.tight });

  if (data.hookUp) {
    heading('Hook-up plan');
    data.hookUp.forEach((l) => para(l, { size: 9 }));
  }

  heading('How this was worked out');
  table(
    [
      { title: 'Assumption', share: 0.25 },
      { title: 'Value', share: 0.35 },
      { title: 'Source', share: 0.4 },
    ],
    data.assumptions.map((a) => [a.label, a.value, a.source]),
  );

  heading('Cautions');
  GENERAL_CAUTIONS.forEach((c) => para(`• ${c}`, { size: 9 }));

  // Page numbers in the bottom margin of every page.
  const range = doc.bufferedPageRange();
  for (let i = 0; i < range.count; i++) {
    doc.switchToPage(range.start + i);
    // Writing inside the bottom margin would otherwise start a new page.
    doc.page.margins.bottom = 0;
    doc.font('regular').fontSize(8).fillColor(colors.inkSoft).text(`${rig.name} · Keyoff budget sheet · page ${i + 1} of ${range.count}`, margin, doc.page.height - margin + 12, { width, align: 'center', lineBreak: false });
  }
  doc.end();
  return done;
}
