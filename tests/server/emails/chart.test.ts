import sharp from 'sharp';
import { describe, expect, it } from 'vitest';

import { weekChartPng, weekChartSvg } from '@/server/emails/chart';

const labels = (svg: string) => [...svg.matchAll(/<text[^>]*text-anchor="middle"[^>]*>([A-Za-z]+)<\/text>/g)].map((m) => m[1]);

describe("the report's week-ahead chart", () => {
  it('names each day at its own noon, from wherever the week starts', () => {
    // 169 hourly points from Sunday 18:00 (hour of the week 6 × 24 + 18): the first noon is Monday's.
    const svg = weekChartSvg(new Array(169).fill(80), 50, 6 * 24 + 18);
    expect(labels(svg)).toEqual(['Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat', 'Sun']);
    expect(svg.match(/<line x1="([\d.]+)" x2="\1" /g)).toHaveLength(7);
  });

  it('starts with the same day when the week starts before noon', () => {
    const svg = weekChartSvg(new Array(169).fill(80), 50, 2 * 24 + 6);
    expect(labels(svg)).toEqual(['Wed', 'Thu', 'Fri', 'Sat', 'Sun', 'Mon', 'Tue']);
  });

  it('renders to a PNG that shows the line at its charge', async () => {
    const png = weekChartPng(new Array(169).fill(60), 50, 0);
    // The SVG is 560 × 200, drawn at twice its width.
    expect(await sharp(png).metadata()).toMatchObject({ format: 'png', width: 1120, height: 400 });
    const { data, info } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
    const at = (x: number, y: number) => [...data.subarray((y * info.width + x) * 3, (y * info.width + x) * 3 + 3)];
    const column = (x: number, from: number, to: number) => Array.from({ length: to - from + 1 }, (_, i) => at(x, from + i));
    // 60 % sits at y = 12 + (1 − 0.60) × 160 = 76 in the SVG, 152 here; the line is the night colour #17324A
    // (23, 50, 74), 2.5 units wide, so within a few pixels of that row at the middle of the plot.
    const near = (p: number[], q: number[]) => p.every((v, i) => Math.abs(v - q[i]) <= 12);
    expect(column(600, 146, 158).some((p) => near(p, [23, 50, 74]))).toBe(true);
    // Above it, between the 100 % grid line (y 24 here) and the line, the plot is its white ground.
    expect(column(600, 40, 80).every((p) => near(p, [255, 255, 255]))).toBe(true);
  });
});
