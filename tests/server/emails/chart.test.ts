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

  it('renders to a PNG', () => {
    const png = weekChartPng(new Array(169).fill(60), 50, 0);
    expect(png.subarray(1, 4).toString()).toBe('PNG');
  });
});
