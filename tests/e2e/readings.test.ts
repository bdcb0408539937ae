import { describe, expect, it } from 'vitest';

import { colors } from '@/shared/theme';
import { restingLog } from '../shared/energy/fixtures';
import { expectChartDrawn, PHONE, shot, signInAs, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

// A generated resting log (not a real one): Wren's 100 Ah AGM battery from 12.65 V to 12.45 V over 50 hours.
// BCI table (REFERENCES.md): 100 % to 75 %, 25 Ah in 50 h = 0.5 A.
const CSV = ['time,battery volts,temp', ...restingLog(50).map((r) => `${r.at.replace('T', ' ').replace(':00.000Z', '')},${r.voltageV},8`), 'broken row,,8'].join('\n');

describe('the Readings screen', () => {
  it('Tobi uploads a CSV log through the page, maps its columns, sees it plotted with its dates and the rough drain, deletes it, then types a reading with current flowing', async () => {
    // Tobi's browser is in Berlin: the log's times (no zone) are read there, and the chart's dates shown there.
    const page = await chrome.page(WIDE, { locale: 'en-GB', timezoneId: 'Europe/Berlin' });
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

    // Both charts drawn: the voltage in the focus blue, the charge in the night colour, each across its width.
    await expectChartDrawn(page.getByTestId('readings-chart-voltage'), colors.focus);
    await expectChartDrawn(page.getByTestId('readings-chart-soc'));
    // Real dates under the chart: 18:00 on 20 November to 20:00 on 22 November, Berlin time, all 51 rows plotted.
    expect(await page.getByTestId('chart-range').innerText()).toMatch(/^20 Nov 2026, 18:00 to 22 Nov 2026, 20:00 \(Europe\/Berlin\): 51 readings\.$/);
    // BCI table: 100 % to 75 % in 50 h, a rough estimate with its range (no current was logged), on Wren's usable
    // 97 Ah (100 Ah at 22 °C: 75 % at 0 °C to 100 % at 25 °C, US Army TM 10-6140-200-14): 24.25 Ah / 50 h = 0.485 A,
    // ±8.5 points (±6 at each end, from memory): 0.32 to 0.65 A.
    expect(await page.getByTestId('measured-drain').innerText()).toMatch(/^about 0\.4[89] A$/);
    expect(await page.getByTestId('drain-method').innerText()).toMatch(/rough estimate.*from 0.32 to 0.65 A/);
    expect(await page.getByTestId('model-message').innerText()).toMatch(/rough estimate \(0.32 to 0.65 A\)/);
    await shot(page, 'readings-wide');

    const phone = await chrome.signedIn('marguerite@example.org', PHONE);
    await phone.goto(page.url());
    await phone.getByTestId('readings-screen').waitFor();
    await phone.getByTestId('upload-wren-resting.csv').waitFor();
    expect(await phone.getByTestId('pick-log').count()).toBe(0);
    expect(await phone.getByTestId('delete-log-wren-resting.csv').count()).toBe(0);
    await shot(phone, 'readings-advisor-phone');

    // Tobi added the log, so Tobi may delete it (a second press confirms); its rows go with it.
    await page.getByTestId('delete-log-wren-resting.csv').click();
    await page.getByTestId('delete-log-wren-resting.csv').click();
    await page.getByTestId('upload-wren-resting.csv').waitFor({ state: 'detached' });
    await page.getByText('Add two readings or upload a log').waitFor();

    // The traveller's case: 12.71 V rested, then 12.55 V two hours later with 0.8 A flowing. Rested starts off
    // again after the first save, and the drain is the measured 0.8 A, not 6.2 A from the fall in voltage.
    const form = page.getByTestId('spot-form');
    const rested = form.getByTestId('field-rested');
    await form.getByTestId('field-at').fill('2026-11-21T08:00');
    await form.getByTestId('field-voltageV').fill('12.71');
    await rested.click();
    expect(await rested.getAttribute('aria-checked')).toBe('true');
    await page.getByTestId('save-reading').click();
    await page.getByText('12.71 V · 100 % · rested').waitFor();
    expect(await rested.getAttribute('aria-checked')).toBe('false');
    await form.getByTestId('field-at').fill('2026-11-21T10:00');
    await form.getByTestId('field-voltageV').fill('12.55');
    await form.getByTestId('field-currentA').fill('0.8');
    await page.getByTestId('save-reading').click();
    await page.getByText('12.55 V · 0.8 A').waitFor();
    expect(await page.getByTestId('measured-drain').innerText()).toBe('0.8 A');
    expect(await page.getByTestId('drain-method').innerText()).toMatch(/over 2 quiet hours, counted from the measured current/);
    expect(await page.getByTestId('model-message').innerText()).toMatch(/22 more needed/);
  }, 90_000);
});
