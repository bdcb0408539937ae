import { type Browser, chromium } from 'playwright-core';

// Kept free of vitest so that the benches (scripts/bench-*.ts) can launch the same browser.

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
