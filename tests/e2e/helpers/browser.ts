import fs from 'node:fs';
import path from 'node:path';

import { AxeBuilder } from '@axe-core/playwright';
import { type Browser, chromium, type Page } from 'playwright-core';

export const viewports = {
  phone: { width: 390, height: 844 },
  wide: { width: 1280, height: 800 },
} as const;
export type ViewportName = keyof typeof viewports;

const screenshotDir = path.resolve(__dirname, '../../../test-results/screenshots');

/**
 * Debian's Chromium, headless, kept off the network it cannot reach anyway. Playwright gives it a
 * fresh temporary profile of its own.
 */
export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--headless',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function newPage(browser: Browser, viewport: ViewportName): Promise<Page> {
  const context = await browser.newContext({ viewport: viewports[viewport] });
  const page = await context.newPage();
  const problems: string[] = [];
  page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
  page.on('console', (m) => {
    // A refused sign-in logs the 401 the page asked for; anything else is a fault.
    if (m.type() === 'error' && !/status of 401/.test(m.text())) problems.push(m.text());
  });
  (page as Page & { problems: string[] }).problems = problems;
  return page;
}

/** Console errors and uncaught exceptions the page produced. */
export const problemsOf = (page: Page) => (page as Page & { problems: string[] }).problems;

export async function screenshot(page: Page, name: string): Promise<void> {
  fs.mkdirSync(screenshotDir, { recursive: true });
  // Pictures still on their way would be empty squares in the picture of the page.
  await page
    .waitForFunction(() => Array.from(document.images).every((image) => image.complete), null, {
      timeout: 5_000,
    })
    .catch(() => undefined);
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}

/**
 * Fails on serious or critical accessibility violations (axe-core's WCAG 2 A/AA rules). `exclude`
 * leaves out what axe cannot enter, such as a frame sandboxed without scripts (axe runs inside
 * each frame it checks).
 */
export async function expectAccessible(
  page: Page,
  { exclude = [] }: { exclude?: string[] } = {},
): Promise<void> {
  const builder = new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa']);
  for (const selector of exclude) builder.exclude(selector);
  const results = await builder.analyze();
  const serious = results.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.help} (${v.nodes.map((n) => n.target.join(' ')).join(', ')})`);
  expect(serious).toEqual([]);
}
