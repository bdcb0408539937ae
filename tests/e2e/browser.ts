import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser, BrowserContextOptions, Locator, Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, expect } from 'vitest';

import { colors } from '@/shared/theme';
import { launchChromium } from './chromium';

export const BASE = process.env.E2E_BASE ?? `http://127.0.0.1:${process.env.E2E_PORT ?? 8091}`;
export const SHOTS = path.resolve('test-results/screenshots');

export { launchChromium, PHONE, WIDE } from './chromium';

/** Signs in through the sign-in screen and waits for the rigs (home) screen. */
export async function signInAs(page: import('playwright-core').Page, email: string, password = 'keyoff-demo-2026') {
  await page.goto(BASE + '/sign-in');
  await page.getByTestId('sign-in-screen').waitFor();
  await page.getByTestId('field-email').fill(email);
  await page.getByTestId('field-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('home-screen').waitFor();
}

const MAILDEV = 'http://127.0.0.1:1080';

/** The last link in the newest e-mail maildev caught for an address (its REST API), optionally by subject. */
export async function mailLink(address: string, subject = /./): Promise<URL> {
  for (let i = 0; i < 50; i++) {
    const all = (await (await fetch(`${MAILDEV}/api/email`)).json()) as { subject: string; text: string; to: { address: string }[] }[];
    const mail = all.reverse().find((m) => m.to.some((t) => t.address === address) && subject.test(m.subject));
    if (mail) return new URL(mail.text.match(/https?:\/\/\S+/g)!.pop()!);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${address}`);
}

/**
 * One Chromium for the test file: launched in `beforeAll`, closed in `afterAll`. `page(viewport)` opens a
 * page; `signedIn(email, viewport)` opens one already on the rigs screen (through the sign-in screen).
 *
 *     const chrome = withBrowser();
 *     const page = await chrome.signedIn('tobi@example.org', PHONE);
 */
export function withBrowser() {
  const handle = {
    browser: undefined as unknown as Browser,
    page: (viewport: { width: number; height: number }, options: BrowserContextOptions = {}) => handle.browser.newPage({ viewport, ...options }),
    async signedIn(email: string, viewport: { width: number; height: number }, options: BrowserContextOptions = {}) {
      const page = await handle.page(viewport, options);
      await signInAs(page, email);
      return page;
    },
  };
  beforeAll(async () => {
    handle.browser = await launchChromium();
  });
  afterAll(async () => {
    await handle.browser?.close();
  });
  return handle;
}

/** Types into a field found by its test id and leaves it, as a person does (the form checks on blur). */
export async function fill(page: Page, testId: string, value: string) {
  const input = page.getByTestId(testId);
  await input.fill(value);
  await input.blur();
}

/** Keeps a picture in test-results/screenshots/<name>.png: one element, or a page (all of it unless fullPage: false). */
export async function shot(target: Page | Locator, name: string, { fullPage = true } = {}) {
  mkdirSync(SHOTS, { recursive: true });
  const file = path.join(SHOTS, `${name}.png`);
  if ('goto' in target) await target.screenshot({ path: file, fullPage });
  else await target.screenshot({ path: file });
}

const rgb = (hex: string) => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));

/**
 * How much of a canvas's width a series is drawn across: the share of its pixel columns with at least one
 * pixel of the line's colour (within a small distance, for anti-aliasing). Axes, grid lines and labels are
 * other colours, so an empty chart reads 0.
 */
export async function seriesCoverage(canvas: Locator, lineColour: string = colors.night) {
  const { data, info } = await sharp(await canvas.screenshot()).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const [r, g, b] = rgb(lineColour);
  let columns = 0;
  for (let x = 0; x < info.width; x++) {
    for (let y = 0; y < info.height; y++) {
      const i = (y * info.width + x) * 3;
      if (Math.abs(data[i] - r) <= 20 && Math.abs(data[i + 1] - g) <= 20 && Math.abs(data[i + 2] - b) <= 20) {
        columns++;
        break;
      }
    }
  }
  return columns / info.width;
}

/**
 * The chart is drawn: its canvas is there and the series line (the night colour by default) runs across
 * at least `share` of its width (an Outlook's line may end where the charge meets the cut-off, so the default
 * is a tenth; an empty chart reads 0). Waits for CanvasKit to paint, up to 15 s.
 */
export async function expectChartDrawn(chart: Locator, lineColour: string = colors.night, share = 0.1) {
  const canvas = chart.locator('canvas').first();
  await canvas.waitFor();
  await expect.poll(() => seriesCoverage(canvas, lineColour), { timeout: 15_000, interval: 250 }).toBeGreaterThan(share);
}
