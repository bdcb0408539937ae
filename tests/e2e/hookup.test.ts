import { describe, expect, it } from 'vitest';

import { PHONE, shot, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

describe('the Hook-up tab', () => {
  it('draws Wren\'s inverter circuit with every part rated, readable on a phone', async () => {
    const page = await chrome.signedIn('tobi@example.org', PHONE);
    await page.getByTestId('open-Wren').click();
    await page.getByTestId('tab-Hook-up').click();
    await page.getByTestId('hookup-now-drawing').waitFor();
    // 300 W / (10.5 V × 0.9) = 31.75 A; × 1.25 = 39.7 A (NEC 210.20(A)): a 40 A fuse (NEC 240.6(A)).
    expect(await page.getByTestId('hookup-part-protection').textContent()).toMatch(/^40 A fuse/);
    // L m one way (1.5 m, or a saved inverter feed's length): 8 AWG drops 31.75 A × 0.778 Ω/kft × 2L / 0.3048 / 1000
    // (NEC Chapter 9 Table 8 at 75 °C); at 1.5 m that is 0.243 V, 2.03 % of 12 V.
    const conductor = (await page.getByTestId('hookup-part-conductor').textContent()) ?? '';
    const lengthM = Number(/positive, ([\d.]+) m/.exec(conductor)?.[1]);
    const dropPercent = ((31.75 * 0.778 * ((2 * lengthM) / 0.3048)) / 1000 / 12) * 100;
    expect(conductor).toMatch(/^8 AWG/);
    expect(Number(/drop ([\d.]+) %/.exec(conductor)?.[1])).toBeCloseTo(dropPercent, 1);
    expect(await page.getByTestId('hookup-cautions').textContent()).toMatch(/qualified auto electrician/);
    // The drawing itself is drawn (its symbols arrive in the drawings' lazy chunk): an SVG per part, inside the phone's width.
    await expect.poll(() => page.locator('[data-testid="hookup-now-drawing"] svg').count()).toBeGreaterThanOrEqual(5);
    const box = await page.getByTestId('hookup-now-drawing').boundingBox();
    expect(box!.width).toBeLessThanOrEqual(390);
    await page.getByTestId('hookup-fix-ignition-relay').click();
    await page.getByTestId('hookup-fix-drawing').waitFor();
    expect(await page.locator('[data-testid="hookup-fix-drawing"] [data-testid="hookup-part-relay"]').textContent()).toMatch(/40 A contacts/);
    await shot(page, 'hookup-phone');
    // The screen scrolls inside the app's frame: each drawing is also taken whole.
    await shot(page.getByTestId('hookup-now'), 'hookup-phone-now');
    await shot(page.getByTestId('hookup-fix-drawing'), 'hookup-phone-fix-drawing');
    await page.close();
  });

  it('puts now and the Fix side by side, previews it, applies it and undoes it from History (owner, wide)', async () => {
    const page = await chrome.signedIn('ines@example.org', WIDE);
    await page.getByTestId('open-Wren').click();
    await page.getByTestId('fix-hookup-ignition-relay').click();
    await page.getByTestId('hookup-fix-drawing').waitFor();
    const now = await page.getByTestId('hookup-now').boundingBox();
    const fix = await page.getByTestId('hookup-fix').boundingBox();
    expect(fix!.x).toBeGreaterThan(now!.x + now!.width - 1);
    await page.getByTestId('fix-preview').click();
    await page.getByTestId('fix-preview-result').waitFor();
    await shot(page, 'hookup-wide');
    await shot(page.getByTestId('hookup-fix'), 'hookup-wide-fix');
    await page.getByTestId('fix-apply').click();
    await page.getByTestId('fix-applied').waitFor();
    await expect.poll(() => page.getByTestId('hookup-now').locator('[role="heading"]').first().textContent()).toMatch(/ignition-keyed relay/);
    await page.getByTestId('tab-History').click();
    await page.getByTestId('history-undo').click();
    await expect.poll(() => page.getByTestId('history-undo').count()).toBe(0);
    await page.getByTestId('tab-Hook-up').click();
    await expect.poll(() => page.getByTestId('hookup-now').locator('[role="heading"]').first().textContent()).toMatch(/always on/);
    await page.close();
  });
});
