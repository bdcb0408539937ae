import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { BASE, launchChromium, PHONE, SHOTS, signInAs, WIDE } from './browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
});

async function fill(page: Page, testId: string, value: string) {
  const input = page.getByTestId(testId);
  await input.fill(value);
  await input.blur();
}

describe('Wire a circuit, the stand-alone calculator', () => {
  it('sizes 20 A over 7.62 m at 3 % as 4 AWG with the cautions beside it (wide)', async () => {
    const page = await browser.newPage({ viewport: WIDE });
    await signInAs(page, 'tobi@example.org');
    await page.goto(BASE + '/cable-runs');
    await page.getByTestId('cable-run-calculator').waitFor();
    await fill(page, 'field-currentA', '20');
    await fill(page, 'field-lengthM', '7.62');
    await page.getByTestId('size-run').click();
    // REFERENCES.md (NEC Table 8, 75 °C): 20 A over 25 ft one way: 4 AWG drops 0.308 V (2.57 %).
    await expect.poll(() => page.getByTestId('result-awg').textContent()).toBe('4');
    expect(await page.getByTestId('cautions').textContent()).toMatch(/auto electrician/);
    // The answer drawn: battery, the fuse at the battery, the cable with its size and drop, the device.
    expect(await page.getByTestId('circuit-drawing').getAttribute('aria-label')).toMatch(/20 A fuse at the battery, 4 AWG .* over 7\.62 m dropping 2\.57 %/);
    // The drawing arrives in the drawings' lazy chunk, into the 150 px its space kept.
    await page.locator('[data-testid="circuit-drawing"] svg').waitFor();
    expect((await page.getByTestId('circuit-drawing').boundingBox())!.height).toBe(150);
    await page.screenshot({ path: path.join(SHOTS, 'cable-runs-wide.png'), fullPage: true });
    await page.getByTestId('circuit-drawing').screenshot({ path: path.join(SHOTS, 'wire-a-circuit-drawing-wide.png') });
    await page.close();
  });

  it('shows the field error inline and sends nothing for a zero length (phone)', async () => {
    const page = await browser.newPage({ viewport: PHONE });
    let posted = 0;
    page.on('request', (r) => {
      if (r.url().includes('/api/cable-runs/size')) posted++;
    });
    await signInAs(page, 'tobi@example.org');
    await page.goto(BASE + '/cable-runs');
    await page.getByTestId('cable-run-calculator').waitFor();
    await fill(page, 'field-lengthM', '0');
    await fill(page, 'field-currentA', 'abc');
    await page.getByTestId('size-run').click();
    // Beside each field, and together in the summary by the button.
    await page.getByText('The length must be more than 0 m.', { exact: true }).waitFor();
    await page.getByText('Current needs a number.', { exact: true }).waitFor();
    expect(await page.getByTestId('form-error-summary').textContent()).toMatch(/2 things to fix:.*Current needs a number.*length must be more than 0 m/);
    expect(posted).toBe(0);
    await page.screenshot({ path: path.join(SHOTS, 'cable-runs-phone-errors.png'), fullPage: true });
    await page.close();
  });
});
