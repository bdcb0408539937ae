import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';

import { BASE, expectChartDrawn, fill, PHONE, shot, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

type StayAnswer = { name: string; socOnArrivalPercent: number; socOnLeavingPercent: number; marginState: string };
type TripAnswer = { stays: StayAnswer[]; series: { socPercent: number; stay: number }[]; cutoffSocPercent: number };

/** The trip's chart: a box of fixed height that keeps its place when the chart arrives, drawn, with its reading in words. */
async function expectTripChart(page: Page, answer: TripAnswer) {
  const chart = page.getByTestId('trip-chart');
  await chart.waitFor();
  const before = (await page.getByTestId('trip-stays').boundingBox())!;
  await expectChartDrawn(chart);
  expect((await chart.boundingBox())!.height).toBe(220);
  expect((await page.getByTestId('trip-stays').boundingBox())!.y).toBe(before.y);
  // The words name the lowest charge of the model's series and the stay it falls in (or where it meets the cut-off).
  const words = (await page.getByTestId('trip-chart-words').textContent())!;
  const lowest = answer.series.reduce((m, p) => (p.socPercent < m.socPercent ? p : m));
  const at = answer.stays[lowest.stay].name;
  if (lowest.socPercent > answer.cutoffSocPercent) {
    expect(words).toMatch(new RegExp(`^Lowest ${Math.round(lowest.socPercent)} % at ${at} on [A-Z][a-z]+day about \\d\\d:00, above the cut-off \\(${answer.cutoffSocPercent} %\\) all trip\\.$`));
  } else {
    expect(words).toMatch(new RegExp(`^Reaches the cut-off \\(${answer.cutoffSocPercent} %\\) at (Lake|Farm) on [A-Z][a-z]+day about \\d\\d:00\\.$`));
  }
  const described = (await chart.getAttribute('aria-describedby'))!;
  expect(await page.evaluate((id) => document.getElementById(id)?.textContent, described)).toBe(words);
}

describe('trips', () => {
  it('plans a trip of two stays and a drive on a phone and reads the margin at each stay', async () => {
    const page = await chrome.signedIn('tobi@example.org', PHONE);
    await page.getByTestId('open-Wren').click();
    await page.getByTestId('tab-Trips').click();
    await page.getByTestId('trips-screen').waitFor();
    await page.getByTestId('add-trip').click();

    const name = `Lake week ${Date.now()}`;
    await fill(page, 'trip-name', name);
    await fill(page, 'trip-start', '2026-06-05');
    await fill(page, 'leg-0-name', 'Lake');
    await fill(page, 'field-legs.0.latitudeDeg', '47.5');
    await fill(page, 'field-legs.0.nights', '5');
    await fill(page, 'field-legs.0.lowC', '9');
    await fill(page, 'field-legs.0.highC', '24');
    await page.getByTestId('add-drive').click();
    await fill(page, 'leg-1-date', '2026-06-10');
    await fill(page, 'field-legs.1.minutes', '40');
    await page.getByTestId('add-stay').click();
    await fill(page, 'leg-2-name', 'Farm');
    await fill(page, 'field-legs.2.latitudeDeg', '47.1');
    await fill(page, 'field-legs.2.nights', '2');
    await page.getByTestId('field-legs.2.shore').click();
    await page.getByTestId('trip-submit').click();

    await page.getByTestId('trip-outlook').waitFor();
    await page.getByTestId('stay-Farm').waitFor();
    const trips = (await (await page.request.get(`${BASE}/api/rigs/${page.url().split('/rigs/')[1].split('/')[0]}/trips`)).json()) as { trips: { id: string; name: string }[] };
    const trip = trips.trips.find((t) => t.name === name)!;
    const rigId = page.url().split('/rigs/')[1].split('/')[0];
    const answer = (await (await page.request.get(`${BASE}/api/rigs/${rigId}/trips/${trip.id}/outlook`)).json()) as TripAnswer;
    // The screen shows each stay's charge on arrival and on leaving and its margin, as the model answers them.
    for (const stay of answer.stays) {
      const figures = await page.getByTestId(`stay-figures-${stay.name}`).textContent();
      expect(figures).toBe(`${stay.socOnArrivalPercent.toFixed(0)} % on arrival → ${stay.socOnLeavingPercent.toFixed(0)} % on leaving`);
      await page.getByTestId(`stay-${stay.name}`).getByTestId(`margin-${stay.marginState}`).waitFor();
    }
    // The farm has shore power all day: Wren leaves it full.
    expect(answer.stays.map((s) => s.name)).toEqual(['Lake', 'Farm']);
    expect(answer.stays[1].socOnLeavingPercent).toBe(100);
    expect(await page.getByTestId('stay-margin-Lake').textContent()).toMatch(/Days to cut-off here|Arrives below the cut-off/);
    await expectTripChart(page, answer);
    await shot(page, 'trips-phone');

    // The same chart on a wide screen, beside nothing wider than its column.
    const wide = await chrome.signedIn('tobi@example.org', WIDE);
    await wide.goto(`${BASE}/rigs/${rigId}/trips`);
    await wide.getByTestId('trip-outlook').waitFor();
    await expectTripChart(wide, answer);
    await shot(wide, 'trips-wide');
    await wide.close();

    // The Outlook follows the active trip.
    await page.getByTestId('tab-Outlook').click();
    await page.getByTestId('outlook-trip').waitFor();
    await page.getByTestId('outlook-trip').getByTestId('stay-Lake').waitFor();
    await shot(page, 'outlook-trip-phone');

    // Put Wren back as it was for the other browser tests.
    await page.getByTestId('tab-Trips').click();
    await page.getByRole('button', { name: `Delete ${name}` }).click();
    await expect.poll(async () => (await (await page.request.get(`${BASE}/api/rigs/${rigId}/trips`)).json()).trips.some((t: { id: string }) => t.id === trip.id)).toBe(false);
    await page.close();
  });
});
