import { describe, expect, it } from 'vitest';

import { BASE, PHONE, shot, signInAs, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

describe('the home screen (Rigs)', () => {
  for (const [label, viewport] of [
    ['phone', PHONE],
    ['wide', WIDE],
  ] as const) {
    it(`renders the demo rigs in Nunito at ${label} size for a signed-in member`, async () => {
      const page = await chrome.page(viewport);
      const errors: string[] = [];
      page.on('pageerror', (e) => errors.push(e.message));
      await signInAs(page, 'ines@example.org');
      await page.getByTestId('days-parked-Wren').waitFor();
      expect(await page.getByTestId('signed-in-as').textContent()).toContain('Ines');
      await page.evaluate(() => document.fonts.ready);
      const title = page.getByRole('heading', { level: 1 }).first();
      expect(await title.evaluate((el) => getComputedStyle(el).fontFamily)).toContain('Nunito');
      // The font file itself loaded, not a fallback under Nunito's name.
      expect(await page.evaluate(() => document.fonts.check('16px Nunito_700Bold'))).toBe(true);
      expect(await page.getByTestId(label === 'wide' ? 'shell-wide' : 'shell-phone').count()).toBe(1);
      await shot(page, `home-${label}`);
      expect(errors).toEqual([]);
      await page.close();
    });
  }

  it('sends a signed-out visitor to sign in, and back to where they were going after', async () => {
    const page = await chrome.page(PHONE);
    await page.goto(BASE + '/cable-runs');
    await page.getByTestId('sign-in-screen').waitFor();
    expect(new URL(page.url()).searchParams.get('next')).toBe('/cable-runs');
    await page.getByTestId('field-email').fill('tobi@example.org');
    await page.getByTestId('field-password').fill('keyoff-demo-2026');
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('cable-run-calculator').waitFor();
    await page.close();
  });

  it('says a sign-in failed without telling whether the address exists', async () => {
    const page = await chrome.page(PHONE);
    await page.goto(BASE + '/sign-in');
    await page.getByTestId('field-email').fill('nobody-here@example.org');
    await page.getByTestId('field-password').fill('wrong-password');
    await page.getByTestId('sign-in-submit').click();
    expect(await page.getByTestId('sign-in-error').textContent()).toBe('That e-mail and password do not match an account.');
    await shot(page, 'sign-in-failed-phone', { fullPage: false });
    await page.close();
  });

  it('shows the not-found page for an unknown path', async () => {
    const page = await chrome.page(PHONE);
    const res = await page.goto(BASE + '/no-such-page');
    expect(res?.status()).toBe(404);
    await page.getByText('Nothing on this circuit').waitFor();
    await page.close();
  });
});
