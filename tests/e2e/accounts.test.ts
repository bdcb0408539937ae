import { describe, expect, it } from 'vitest';

import { BASE, mailLink, PHONE, shot, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

describe('accounts in the browser', () => {
  it('signs up, confirms the address through the link caught by maildev, and lands on the home screen', async () => {
    const page = await chrome.page(PHONE);
    const email = `traveller-${Date.now()}@example.org`;
    await page.goto(BASE + '/sign-up');
    await page.getByTestId('field-name').fill('Juno Traveller');
    await page.getByTestId('field-email').fill(email);
    await page.getByTestId('field-password').fill('short');
    await page.getByTestId('sign-up-submit').click();
    await page.getByText('The password needs at least 10 characters.', { exact: true }).waitFor();
    await page.getByTestId('field-password').fill('a-long-enough-password');
    await page.getByTestId('sign-up-submit').click();
    await page.getByTestId('check-inbox-screen').waitFor();
    await shot(page, 'check-inbox-phone', { fullPage: false });

    const link = await mailLink(email, /Confirm your e-mail/);
    // The link points at the app's configured address; the browser tests serve it on their own port.
    await page.goto(BASE + link.pathname + link.search);
    await page.getByTestId('home-screen').waitFor();
    await page.getByTestId('rigs-empty').waitFor();
    expect(await page.getByTestId('signed-in-as').textContent()).toContain('Juno');
    await page.close();
  });

  it('shows the owner the People of Wren with invite controls, and the advisor without them', async () => {
    const owner = await chrome.signedIn('ines@example.org', WIDE);
    await owner.getByTestId('people-Wren').click();
    await owner.getByTestId('people-screen').waitFor();
    await owner.getByTestId('member-marguerite@example.org').waitFor();
    expect(await owner.getByTestId('invite-form').count()).toBe(1);
    await shot(owner, 'people-wide');
    await owner.close();

    const advisor = await chrome.signedIn('marguerite@example.org', PHONE);
    await advisor.getByTestId('people-Wren').click();
    await advisor.getByTestId('people-screen').waitFor();
    expect(await advisor.getByTestId('invite-form').count()).toBe(0);
    await shot(advisor, 'people-advisor-phone');
    await advisor.close();
  });
});
