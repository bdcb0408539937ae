import { describe, expect, it } from 'vitest';

import { BASE, fill, PHONE, shot, signInAs, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

describe('Wire a circuit, the stand-alone calculator', () => {
  it('sizes 20 A over 7.62 m at 3 % as 4 AWG with the cautions beside it (wide)', async () => {
    const page = await chrome.signedIn('tobi@example.org', WIDE);
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
    await shot(page, 'cable-runs-wide');
    await shot(page.getByTestId('circuit-drawing'), 'wire-a-circuit-drawing-wide');
    await page.close();
  });

  it('shows the field error inline and sends nothing for a zero length (phone)', async () => {
    const page = await chrome.page(PHONE);
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
    await shot(page, 'cable-runs-phone-errors');
    await page.close();
  });
});
