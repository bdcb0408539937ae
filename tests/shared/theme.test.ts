import { describe, expect, it } from 'vitest';

import { colors } from '@/shared/theme';

// WCAG 2.x: relative luminance and contrast ratio (W3C, Web Content Accessibility Guidelines 2.1,
// definitions "relative luminance" and "contrast ratio"); AA asks 4.5:1 for body text.
function luminance(hex: string) {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
const contrast = (a: string, b: string) => {
  const [x, y] = [luminance(a), luminance(b)].sort((p, q) => q - p);
  return (x + 0.05) / (y + 0.05);
};

describe('the palette', () => {
  it('gives white on black 21:1 (the formula itself)', () => {
    expect(contrast('#FFFFFF', '#000000')).toBeCloseTo(21, 5);
  });

  const pairs: [string, string, string][] = [
    ['body text on a card', colors.ink, colors.card],
    ['secondary text on a card', colors.inkSoft, colors.card],
    ['secondary text on the page', colors.inkSoft, colors.paper],
    ['Comfortable on a card', colors.comfortable, colors.card],
    ['Tight on a card', colors.tight, colors.card],
    ['Short on a card', colors.short, colors.card],
    ['Short on the page', colors.short, colors.paper],
    ['links on a card', colors.focus, colors.card],
    ['links on the page', colors.focus, colors.paper],
    ['page colour on the rail', colors.paper, colors.night],
    ['the lamp accent on the active rail item', colors.lamp, colors.nightSoft],
  ];
  it.each(pairs)('passes WCAG AA (4.5:1) for %s', (_name, fg, bg) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
