import path from 'node:path';
import { type Browser, chromium } from 'playwright-core';

export const BASE = process.env.E2E_BASE ?? `http://127.0.0.1:${process.env.E2E_PORT ?? 8091}`;
export const SHOTS = path.resolve('test-results/screenshots');

/** Debian's chromium, headless, with none of its background traffic; playwright gives each launch a fresh profile. */
export function launchChromium(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export const PHONE = { width: 390, height: 844 };
export const WIDE = { width: 1280, height: 800 };

/** Signs in through the sign-in screen and waits for the rigs (home) screen. */
export async function signInAs(page: import('playwright-core').Page, email: string, password = 'keyoff-demo-2026') {
  await page.goto(BASE + '/sign-in');
  await page.getByTestId('sign-in-screen').waitFor();
  await page.getByTestId('field-email').fill(email);
  await page.getByTestId('field-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await page.getByTestId('home-screen').waitFor();
}

const MAILDEV = 'http://127.0.0.1:1080';

/** The last link in the newest e-mail maildev caught for an address (its REST API), optionally by subject. */
export async function mailLink(address: string, subject = /./): Promise<URL> {
  for (let i = 0; i < 50; i++) {
    const all = (await (await fetch(`${MAILDEV}/api/email`)).json()) as { subject: string; text: string; to: { address: string }[] }[];
    const mail = all.reverse().find((m) => m.to.some((t) => t.address === address) && subject.test(m.subject));
    if (mail) return new URL(mail.text.match(/https?:\/\/\S+/g)!.pop()!);
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`no mail for ${address}`);
}
