import { describe, expect, it } from 'vitest';

import { PHONE, shot, WIDE, withBrowser } from './browser';

const chrome = withBrowser();

describe('notes between an advisor and a household', () => {
  it('the advisor writes on the fridge from Clients; the owner sees it unread, replies and resolves; at phone and wide sizes', async () => {
    const text = `Duty cycle looks high for a 40 L fridge (${Date.now()}).`;

    // The advisor on a phone: Clients lists Wren; opening it goes to its Notes.
    const advisor = await chrome.signedIn('marguerite@example.org', PHONE);
    await advisor.getByRole('link', { name: 'Clients' }).click();
    await advisor.getByTestId('clients-screen').waitFor();
    await advisor.getByTestId('client-Wren').click();
    await advisor.getByTestId('new-note').waitFor();
    // An empty note: the form says so by the button and focuses the note field; nothing is posted.
    await advisor.getByTestId('post-note').click();
    await advisor.getByTestId('form-error-summary').getByText('Write something first.').waitFor();
    expect(await advisor.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('field-body');
    expect(await advisor.getByTestId('new-note').innerText()).toContain('0 of 4000');
    await advisor.getByRole('radio', { name: 'Compressor fridge (40 L)' }).click();
    await advisor.getByTestId('field-body').fill(text);
    await advisor.getByTestId('post-note').click();
    const thread = advisor.locator('[data-testid^="thread-"]', { hasText: text });
    await thread.waitFor();
    expect(await thread.innerText()).toContain('About Compressor fridge (40 L)');
    await shot(advisor, 'notes-advisor-phone');

    // The owner on a wide screen: the Notes tab counts it, she replies and resolves the thread.
    const owner = await chrome.signedIn('ines@example.org', WIDE);
    await owner.getByTestId('open-Wren').click();
    await owner.getByTestId('outlook-screen').waitFor();
    const tab = owner.getByTestId('tab-Notes');
    await expect.poll(() => tab.innerText()).toMatch(/^Notes \(\d+ new\)$/);
    await tab.click();
    const ownerThread = owner.locator('[data-testid^="thread-"]', { hasText: text });
    await ownerThread.waitFor();
    const threadId = (await ownerThread.getAttribute('data-testid'))!.replace('thread-', '');
    await owner.getByTestId(`reply-${threadId}`).click();
    await ownerThread.getByTestId('field-body').fill('Turned the thermostat down a notch.');
    await owner.getByTestId(`post-reply-${threadId}`).click();
    await ownerThread.getByText('Turned the thermostat down a notch.').waitFor();
    await owner.getByTestId(`resolve-${threadId}`).click();
    await owner.getByTestId('toggle-resolved').waitFor();
    await expect.poll(() => tab.innerText()).toBe('Notes');
    await shot(owner, 'notes-owner-wide');

    // The advisor on a wide screen: Clients shows the unread reply; the rig opens with Notes beside it.
    const advisorWide = await chrome.signedIn('marguerite@example.org', WIDE);
    await advisorWide.getByRole('link', { name: 'Clients' }).click();
    await advisorWide.getByTestId('unread-Wren').waitFor();
    await advisorWide.getByTestId('client-Wren').click();
    await advisorWide.getByTestId('client-detail').waitFor();
    await advisorWide.getByTestId('outlook-screen').waitFor();
    await advisorWide.getByTestId('toggle-resolved').click();
    const resolved = advisorWide.locator('[data-testid^="thread-"]', { hasText: text });
    await resolved.getByText('Turned the thermostat down a notch.').waitFor();
    expect(await resolved.innerText()).toContain('resolved');
    await shot(advisorWide, 'clients-advisor-wide');

    // The owner on a phone sees the same thread, resolved.
    const ownerPhone = await chrome.signedIn('ines@example.org', PHONE);
    await ownerPhone.getByTestId('open-Wren').click();
    await ownerPhone.getByTestId('tab-Notes').click();
    expect((await ownerPhone.getByTestId('toggle-resolved').boundingBox())!.height).toBeGreaterThanOrEqual(44);
    await ownerPhone.getByTestId('toggle-resolved').click();
    await ownerPhone.locator('[data-testid^="thread-"]', { hasText: text }).waitFor();
    await shot(ownerPhone, 'notes-owner-phone');
  }, 120_000);
});
