import { mkdirSync } from 'node:fs';
import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { BASE, launchChromium, PHONE, SHOTS, WIDE } from './browser';

let browser: Browser;
beforeAll(async () => {
  mkdirSync(SHOTS, { recursive: true });
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

describe('the home screen', () => {
  for (const [label, viewport] of [
    ['phone', PHONE],
    ['wide', WIDE],
  ] as const) {
    it(`renders in Nunito with the service state at ${label} size`, async () => {
      const page = await browser.newPage({ viewport });
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await page.goto(BASE + '/');
      await page.getByTestId('home-screen').waitFor();
      await expect.poll(() => page.getByTestId('health-status').textContent()).toContain('database connected');
      await page.evaluate(() => document.fonts.ready);
      const title = page.getByRole('heading', { level: 1 }).first();
      const family = await title.evaluate((el) => getComputedStyle(el).fontFamily);
      expect(family).toContain('Nunito');
      // The font file itself loaded, not a fallback under Nunito's name.
      expect(await page.evaluate(() => document.fonts.check('16px Nunito_700Bold'))).toBe(true);
      const shell = label === 'wide' ? 'shell-wide' : 'shell-phone';
      await expect(page.getByTestId(shell)).toBeDefined();
      expect(await page.getByTestId(shell).count()).toBe(1);
      await page.screenshot({ path: path.join(SHOTS, `home-${label}.png`), fullPage: true });
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it('shows the not-found page for an unknown path', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    const res = await page.goto(BASE + '/no-such-page');
    expect(res?.status()).toBe(404);
    await page.getByText('Nothing on this circuit').waitFor();
    await page.close();
  });
});
