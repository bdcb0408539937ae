import path from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { restingLog } from '../shared/energy/fixtures';
import { launchChromium, SHOTS, signInAs, WIDE, PHONE } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

// A generated resting log (not a real one): Wren's 100 Ah AGM battery from 12.65 V to 12.45 V over 50 hours.
// BCI table (REFERENCES.md): 100 % to 75 %, 25 Ah in 50 h = 0.5 A.
const CSV = ['time,battery volts,temp', ...restingLog(50).map((r) => `${r.at.replace('T', ' ').replace(':00.000Z', '')},${r.voltageV},8`), 'broken row,,8'].join('\n');

describe('the Readings screen', () => {
  it('Tobi uploads a CSV log through the page, maps its columns, and sees it charted with the measured standby', async () => {
    const page = await browser.newPage({ viewport: WIDE });
    await signInAs(page, 'tobi@example.org');
    await page.getByTestId('open-Wren').click();
    await page.getByTestId('tab-Readings').click();
    await page.getByTestId('readings-screen').waitFor();
    expect(await page.getByRole('note').first().innerText()).toMatch(/eye protection/);

    await page.getByTestId('pick-log-input').setInputFiles({ name: 'wren-resting.csv', mimeType: 'text/csv', buffer: Buffer.from(CSV) });
    await page.getByTestId('mapping').waitFor();
    await page.getByTestId('map-time-time').click();
    await page.getByTestId('map-voltage-battery volts').click();
    await page.getByTestId('log-rested').click();
    await page.getByTestId('upload-log').click();
    const result = page.getByTestId('upload-result');
    await result.waitFor();
    expect(await result.innerText()).toMatch(/51 rows stored, 1 refused:[\s\S]*line 53: time "broken row" is not a date and time; no voltage/);

    await page.getByTestId('readings-chart').locator('canvas').waitFor();
    await page.waitForTimeout(1000);
    expect((await page.getByTestId('readings-chart').screenshot()).length).toBeGreaterThan(4000);
    const drain = Number((await page.getByTestId('measured-drain').innerText()).replace(' A', ''));
    expect(Math.abs(drain - 0.5) / 0.5).toBeLessThan(0.1);
    expect(await page.getByTestId('standby-message').innerText()).toMatch(/A measured/);
    await page.screenshot({ path: path.join(SHOTS, 'readings-wide.png'), fullPage: true });

    const phone = await browser.newPage({ viewport: PHONE });
    await signInAs(phone, 'marguerite@example.org');
    await phone.goto(page.url());
    await phone.getByTestId('readings-screen').waitFor();
    await phone.getByTestId('upload-wren-resting.csv').waitFor();
    expect(await phone.getByTestId('pick-log').count()).toBe(0);
    await phone.screenshot({ path: path.join(SHOTS, 'readings-advisor-phone.png'), fullPage: true });
  }, 90_000);
});
