import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

import { loadConfig } from '@/server/config';
import { type AppContext, createContext } from '@/server/context';
import { enqueueDueReports } from '@/server/jobs/reports';
import { PHONE, shot, WIDE, withBrowser } from './browser';

const chrome = withBrowser();
let ctx: AppContext;
beforeAll(async () => {
  // The schedule's tick, run from here at a time the test picks; the server's own workers send the e-mail.
  const config = loadConfig({ ...process.env, RUN_WORKERS: 'false', LOG_LEVEL: 'silent' });
  ctx = createContext(process.env, { config, logger: pino({ level: 'silent' }) });
  await ctx.jobs.start();
});
afterAll(async () => {
  await ctx?.jobs.stop();
  await ctx?.db.destroy();
});

const WEEKDAY = ['Monday', 'Tuesday', 'Wednesday', 'Thursday', 'Friday', 'Saturday', 'Sunday'];

describe('weekly report settings and the Reports screen', () => {
  it('Tobi chooses his report hour in Settings; the report arrives and shows on Reports as sent', async () => {
    const now = new Date();
    const weekday = (now.getUTCDay() + 6) % 7;
    const page = await chrome.signedIn('tobi@example.org', PHONE);
    await page.getByRole('link', { name: 'Settings' }).click();
    await page.getByTestId('email-prefs').waitFor();
    await page.getByRole('radio', { name: WEEKDAY[weekday] }).click();
    // The browser's own time picker and the runtime's list of zones (an unknown zone cannot be chosen here;
    // the server's refusal of one is in tests/server).
    await page.getByTestId('field-reportHour').fill(`${String(now.getUTCHours()).padStart(2, '0')}:00`);
    await page.getByTestId('field-timeZone').selectOption('UTC');
    await page.getByTestId('save-email-prefs').click();
    await page.getByText('Saved.').waitFor();
    await shot(page, 'settings-email-phone');

    expect(await enqueueDueReports(ctx, ctx.jobs, now)).toBeGreaterThanOrEqual(1);

    const wide = await chrome.signedIn('tobi@example.org', WIDE);
    await wide.getByTestId('open-Wren').click();
    await wide.getByTestId('tab-Reports').click();
    const row = wide.locator('[data-testid^="email-"]', { hasText: 'Weekly report to Tobi' }).first();
    await expect.poll(async () => {
      await wide.reload();
      await wide.getByTestId('reports').waitFor();
      return row.count();
    }, { timeout: 20_000 }).toBeGreaterThan(0);
    await row.click();
    const frame = wide.frameLocator('[data-testid="email-frame"]');
    await frame.getByText('Wren: your week ahead').waitFor();
    await frame.getByText('Days on your routine', { exact: true }).first().waitFor();
    // The chart image loads from the server (a PNG drawn there), not a broken picture.
    const loaded = await frame.locator('img[alt^="State of charge"]').evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 500);
    expect(loaded).toBe(true);
    await shot(wide, 'reports-wide');
  }, 90_000);
});
