import type { BrowserContext } from 'playwright-core';
import { describe, expect, it } from 'vitest';

import { OFFLINE_WRITE } from '@/lib/api-client';
import { fill, PHONE, shot, signInAs, withBrowser } from './browser';

// With the signal gone: the last Outlook still reads (from the service worker's cache, marked as such),
// Try a load works on the device, and a save says at once that it was not saved and keeps the form.
const chrome = withBrowser();

/** Opens Wren's Outlook online and waits until the service worker controls the page and has kept its answers. */
async function visitOutlookOnline(context: BrowserContext) {
  const page = await context.newPage();
  await signInAs(page, 'ines@example.org');
  await page.getByTestId('open-Wren').click();
  await page.getByTestId('figure-days-parked').waitFor();
  await page.waitForFunction(() => navigator.serviceWorker.controller !== null, undefined, { timeout: 30_000 });
  await page.waitForFunction(
    async (url) => !!(await caches.open('keyoff-api').then((c) => c.match(url, { ignoreVary: true }))),
    `${new URL(page.url()).pathname.replace(/^\/rigs\//, '/api/rigs/')}/outlook`,
    { timeout: 30_000, polling: 250 },
  );
  return page;
}

describe('offline', () => {
  it('reloads the last Outlook offline with its figures and says from when they are', async () => {
    const context = await chrome.browser.newContext({ viewport: PHONE });
    const page = await visitOutlookOnline(context);
    const online = await page.getByTestId('figure-days-parked').textContent();
    expect(await page.getByTestId('offline-notice').count()).toBe(0);
    expect(await page.title()).toBe('Outlook · Wren · Keyoff');

    await context.setOffline(true);
    await page.reload();
    await page.getByTestId('offline-notice').waitFor();
    expect(await page.getByTestId('offline-notice').textContent()).toMatch(/^Offline: figures from \d{1,2}:\d{2}/);
    expect(await page.getByTestId('figure-days-parked').textContent()).toBe(online);
    await page.getByTestId('drains').waitFor();
    await page.getByTestId('fixes').waitFor();
    await shot(page, 'outlook-offline-phone');

    await context.setOffline(false);
    await page.reload();
    await page.getByTestId('figure-days-parked').waitFor();
    await expect.poll(() => page.getByTestId('offline-notice').count()).toBe(0);
    await context.close();
  });

  it('tries a load on the device offline, and a save offline says so at once and keeps what was typed', async () => {
    const context = await chrome.browser.newContext({ viewport: PHONE });
    const page = await visitOutlookOnline(context);
    // The rig itself is read once online (the Loads tab), so this device has it.
    await page.getByTestId('tab-Loads').click();
    await page.getByTestId('load-Laptop').waitFor();
    await context.setOffline(true);

    await page.getByTestId('tab-Try a load').click();
    await page.getByTestId('try-screen').waitFor();
    await fill(page, 'field-name', 'Kettle');
    await page.getByTestId('field-supply-ac').click();
    await fill(page, 'field-watts', '250');
    await fill(page, 'field-hoursPerDay', '0.2');
    await page.getByTestId('load-submit').click();
    await page.getByTestId('try-result').waitFor();
    await page.getByTestId('try-on-device').waitFor();
    expect(await page.getByTestId('try-result').textContent()).toMatch(/With Kettle/);
    await shot(page, 'try-offline-phone');

    await page.getByTestId('tab-Loads').click();
    await page.getByTestId('add-load').click();
    await fill(page, 'field-name', 'Reading lamp');
    await fill(page, 'field-watts', '4');
    await fill(page, 'field-hoursPerDay', '2');
    const t0 = Date.now();
    await page.getByTestId('load-submit').click();
    await page.getByRole('alert').filter({ hasText: OFFLINE_WRITE }).waitFor({ timeout: 5000 });
    expect(Date.now() - t0).toBeLessThan(5000);
    expect(await page.getByTestId('field-name').inputValue()).toBe('Reading lamp');
    expect(await page.getByTestId('field-watts').inputValue()).toBe('4');
    await shot(page, 'save-offline-phone');
    await context.close();
  });

  it('forgets the saved answers when the traveller signs out', async () => {
    const context = await chrome.browser.newContext({ viewport: PHONE });
    const page = await visitOutlookOnline(context);
    await page.getByTestId('sign-out').first().click();
    await page.getByTestId('sign-in-screen').waitFor();
    expect(await page.evaluate(() => caches.has('keyoff-api'))).toBe(false);
    await context.close();
  });
});
