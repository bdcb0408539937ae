import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';

import { BASE, PHONE, shot, signInAs, WIDE, withBrowser } from './browser';

// axe-core over every screen (AxeBuilder wants a page of a context made with newContext), at a phone's width and a desktop's: no serious or critical violation of
// WCAG 2.1 A and AA. Each screen's picture is kept beside the others in test-results/screenshots.

const chrome = withBrowser();

type Finding = { screen: string; size: string; rule: string; impact: string; targets: string[] };

async function audit(page: Page, screen: string, size: string, findings: Finding[]) {
  // Charts draw after CanvasKit loads; fonts and queries settle first.
  await page.waitForLoadState('networkidle');
  await page.waitForTimeout(400);
  await shot(page, `a11y-${screen}-${size}`);
  const result = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa']).analyze();
  for (const v of result.violations) {
    if (v.impact === 'serious' || v.impact === 'critical') {
      findings.push({ screen, size, rule: v.id, impact: v.impact, targets: v.nodes.slice(0, 3).map((n) => n.target.join(' ')) });
    }
  }
}

const SIZES = [
  ['phone', PHONE],
  ['wide', WIDE],
] as const;

describe('accessibility of every screen (axe-core)', () => {
  for (const [size, viewport] of SIZES) {
    it(`has no serious or critical violation on any screen at ${viewport.width} px`, async () => {
      const findings: Finding[] = [];
      const context = await chrome.browser.newContext({ viewport });
      const page = await context.newPage();
      for (const [screen, url, ready] of [
        ['sign-in', '/sign-in', 'sign-in-screen'],
        ['sign-up', '/sign-up', 'sign-up-screen'],
        ['forgot-password', '/forgot-password', 'forgot-password-screen'],
      ] as const) {
        await page.goto(BASE + url);
        await page.getByTestId(ready).waitFor();
        await audit(page, screen, size, findings);
      }

      await signInAs(page, 'ines@example.org');
      await audit(page, 'rigs', size, findings);
      await page.getByTestId('open-Wren').click();
      await page.getByTestId('outlook-screen').waitFor();
      const rigPath = new URL(page.url()).pathname;
      const screens: [string, string, string][] = [
        ['outlook', rigPath, 'outlook-screen'],
        ['loads', `${rigPath}/loads`, 'loads-screen'],
        ['power', `${rigPath}/power`, 'power-screen'],
        ['try', `${rigPath}/try`, 'try-screen'],
        ['rig-cable-runs', `${rigPath}/cable-runs`, 'rig-cable-runs-screen'],
        ['readings', `${rigPath}/readings`, 'spot-form'],
        ['notes', `${rigPath}/notes`, 'new-note'],
        ['people', `${rigPath}/people`, 'invite-form'],
        ['history', `${rigPath}/history`, 'history'],
        ['reports', `${rigPath}/reports`, 'reports'],
        ['new-rig', '/rigs/new', 'new-rig-screen'],
        ['settings', '/settings', 'email-prefs'],
        ['cable-run-calculator', '/cable-runs', 'cable-run-calculator'],
      ];
      for (const [screen, url, ready] of screens) {
        await page.goto(BASE + url);
        await page.getByTestId(ready).first().waitFor();
        await audit(page, screen, size, findings);
      }
      // The add-a-load form and a form showing its errors.
      await page.goto(BASE + `${rigPath}/loads`);
      await page.getByTestId('add-load').click();
      await page.getByTestId('load-submit').click();
      await audit(page, 'load-form-errors', size, findings);
      await context.close();

      // The advisor's Clients screen.
      const advisorContext = await chrome.browser.newContext({ viewport });
      const advisor = await advisorContext.newPage();
      await signInAs(advisor, 'marguerite@example.org');
      await advisor.goto(BASE + '/clients');
      await advisor.getByTestId('clients-screen').waitFor();
      await audit(advisor, 'clients', size, findings);
      await advisorContext.close();

      expect(findings, JSON.stringify(findings, null, 1)).toEqual([]);
    }, 300_000);
  }
});
