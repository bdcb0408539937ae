import { createRequire } from 'node:module';
import { Resvg } from '@resvg/resvg-js';

import { colors } from '@/shared/theme';

const require_ = createRequire(__filename);
const FONT = require_.resolve('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf');
const DAYS = ['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun'];

/**
 * The week ahead's state of charge as an SVG: the line, the cut-off, a faint line at each midnight and
 * each day's name at its noon. firstHourOfWeek is the hour of the week (Monday 00:00 = 0) of the first
 * point; the points are an hour apart. Our own drawing, no chart library.
 */
export function weekChartSvg(socPercent: number[], cutoffSocPercent: number, firstHourOfWeek: number, parkedSocPercent?: number[]) {
  const w = 560;
  const h = 200;
  const left = 40;
  const right = 12;
  const top = 12;
  const bottom = 28;
  const iw = w - left - right;
  const ih = h - top - bottom;
  const n = Math.max(1, socPercent.length - 1);
  const x = (i: number) => left + (i / n) * iw;
  const y = (soc: number) => top + (1 - Math.max(0, Math.min(100, soc)) / 100) * ih;
  const path = (series: number[]) => series.map((s, i) => `${i ? 'L' : 'M'}${x(i).toFixed(1)} ${y(s).toFixed(1)}`).join(' ');
  const line = path(socPercent);
  // The budget sheet adds the parked line (no driving at all) in grey under the routine's.
  const parked = parkedSocPercent ? `<path d="${path(parkedSocPercent)}" fill="none" stroke="${colors.inkSoft}" stroke-width="1.5" stroke-dasharray="2 3"/>` : '';
  const grid = [0, 50, 100]
    .map((v) => `<line x1="${left}" x2="${w - right}" y1="${y(v)}" y2="${y(v)}" stroke="${colors.line}" stroke-width="1"/><text x="${left - 6}" y="${y(v) + 4}" font-size="11" text-anchor="end" fill="${colors.inkSoft}">${v} %</text>`)
    .join('');
  let midnights = '';
  let days = '';
  for (let i = 0; i < socPercent.length; i++) {
    const at = (firstHourOfWeek + i) % 168;
    const hourOfDay = at % 24;
    if (hourOfDay === 0 && i > 0) midnights += `<line x1="${x(i).toFixed(1)}" x2="${x(i).toFixed(1)}" y1="${top}" y2="${h - bottom}" stroke="${colors.line}" stroke-width="1"/>`;
    if (hourOfDay === 12) days += `<text x="${x(i).toFixed(1)}" y="${h - 8}" font-size="11" text-anchor="middle" fill="${colors.inkSoft}">${DAYS[Math.floor(at / 24)]}</text>`;
  }
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${w}" height="${h}" viewBox="0 0 ${w} ${h}" font-family="Nunito">
<rect width="${w}" height="${h}" fill="#FFFFFF"/>${grid}${midnights}
<line x1="${left}" x2="${w - right}" y1="${y(cutoffSocPercent)}" y2="${y(cutoffSocPercent)}" stroke="${colors.short}" stroke-width="1.5" stroke-dasharray="6 4"/>
<text x="${w - right}" y="${y(cutoffSocPercent) - 4}" font-size="11" text-anchor="end" fill="${colors.short}">cut-off ${cutoffSocPercent} %</text>
${parked}<path d="${line}" fill="none" stroke="${colors.night}" stroke-width="2.5" stroke-linejoin="round"/>${days}
</svg>`;
}

/** The chart as a PNG for the e-mail (mail programs do not show SVG), drawn with the app's own Nunito. */
export function weekChartPng(socPercent: number[], cutoffSocPercent: number, firstHourOfWeek: number): Buffer {
  return svgToPng(weekChartSvg(socPercent, cutoffSocPercent, firstHourOfWeek));
}

/** An SVG chart as a PNG at twice its width (sharp in mail and print), drawn with the app's own Nunito. */
export function svgToPng(svg: string, widthPx = 1120): Buffer {
  return new Resvg(svg, { font: { fontFiles: [FONT], loadSystemFonts: false, defaultFontFamily: 'Nunito' }, fitTo: { mode: 'width', value: widthPx } }).render().asPng();
}
