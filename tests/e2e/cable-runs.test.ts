import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';

import { CIRCUIT_LABELS as L } from '@/shared/schemas/circuit';
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
    await expect.poll(() => page.getByTestId('circuit-awg').textContent()).toBe('4');
    expect(await page.getByTestId('circuit-cautions').textContent()).toMatch(/auto electrician/);
    // The answer drawn: battery, the fuse at the battery, the cable with its size and drop, the device.
    expect(await page.getByTestId('circuit-drawing').getAttribute('aria-label')).toMatch(/20 A fuse at the battery, 4 AWG over 7\.62 m dropping 2\.57 %/);
    // The drawing arrives in the drawings' lazy chunk, into the 150 px its space kept.
    await page.locator('[data-testid="circuit-drawing"] svg').waitFor();
    expect((await page.getByTestId('circuit-drawing').boundingBox())!.height).toBe(150);
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

const SIZES = [
  ['phone', PHONE],
  ['wide', WIDE],
] as const;

/** The field labels of the circuit form on the page, in their order. */
const labelsOf = (page: Page) => page.getByTestId('circuit-form').locator('[id$="-label"]').allInnerTexts();

/** Opens Wren's Cable runs as Ines (the owner); answers the rig's path. */
async function openWrenRuns(page: Page) {
  await signInAs(page, 'ines@example.org');
  await page.getByTestId('open-Wren').click();
  await page.getByTestId('outlook-screen').waitFor();
  const rigPath = new URL(page.url()).pathname;
  await page.goto(BASE + rigPath + '/cable-runs');
  await page.getByTestId('rig-cable-runs-screen').waitFor();
  return rigPath;
}

describe('one circuit form for Wire a circuit and a saved run', () => {
  for (const [name, viewport] of SIZES) {
    it(`asks the same fields in the same words and order on both (${name})`, async () => {
      const page = await chrome.page(viewport);
      await openWrenRuns(page);
      await page.getByTestId('add-run').click();
      await page.getByTestId('circuit-form').waitFor();
      const saved = await labelsOf(page);
      await shot(page, `cable-runs-saved-form-${name}`);
      await page.goto(BASE + '/cable-runs');
      await page.getByTestId('cable-run-calculator').waitFor();
      const calculator = await labelsOf(page);
      // The circuit's own fields, in the order both show them; each variant adds only its extras.
      const shared = [L.end, L.to, L.current, L.route, L.cableType, L.length, L.return, L.allowedDrop, L.continuous, L.existingAwg];
      expect(saved.filter((l) => !shared.includes(l as never))).toEqual(['Name']);
      expect(calculator.filter((l) => !shared.includes(l as never))).toEqual([L.systemVoltage]);
      expect(saved.filter((l) => shared.includes(l as never))).toEqual(shared);
      expect(calculator.filter((l) => shared.includes(l as never))).toEqual(shared);
      await page.close();
    });
  }
});

describe("the voltage-drop test's verdict in the browser", () => {
  for (const [name, viewport] of SIZES) {
    it(`says a 4.5 % drop on a run allowed 3 % is over its limit (${name})`, async () => {
      const page = await chrome.page(viewport);
      const rigPath = await openWrenRuns(page);
      const label = `Drop check feed ${viewport.width}`;
      await page.getByTestId('add-run').click();
      await fill(page, 'field-label', label);
      await fill(page, 'field-to', 'Inverter');
      await fill(page, 'field-currentA', '30');
      await fill(page, 'field-lengthM', '2');
      await fill(page, 'field-maxDropPercent', '3');
      await page.getByTestId('run-submit').click();
      await page.getByTestId(`run-size-${label}`).waitFor();
      await page.goto(BASE + rigPath + '/readings');
      await page.getByTestId('drop-test').waitFor();
      // 12.60 V at the battery, 12.033 V at the inverter: 0.567 V lost, 4.5 % of 12.6 V (arithmetic);
      // an inverter feed may lose 3 % (ABYC E-11), so 1.5 points over.
      const card = page.getByTestId('drop-test');
      for (const [field, value] of [['batteryV', '12.6'], ['pointV', '12.033'], ['currentA', '30']]) {
        await card.getByTestId(`field-${field}`).fill(value);
        await card.getByTestId(`field-${field}`).blur();
      }
      await card.getByText(label, { exact: true }).click();
      await page.getByTestId('run-drop-test').click();
      const verdict = page.getByTestId('drop-verdict');
      await verdict.waitFor();
      expect(await verdict.innerText()).toMatch(/Over its limit\. 4\.5 % lost on a run allowed 3 %: 1\.5 points over\./);
      await verdict.scrollIntoViewIfNeeded();
      await shot(page, `drop-verdict-${name}`);
      await page.close();
    });
  }
});
