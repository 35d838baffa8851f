import fs from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { browserPath } from '@/scripts/find-browser';

export const SCREENSHOT_DIR = path.resolve(__dirname, '..', '..', 'test-results');

import { startServer, type RunningServer } from './server-process';

export { startServer, type RunningServer };

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: browserPath(),
    args: [
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

export const VIEWPORTS = {
  phone: { width: 360, height: 800 },
  desktop: { width: 1440, height: 900 },
} as const;

/**
 * Screenshots are for people to review at both widths; CI, where nobody looks at them, turns them off
 * (`E2E_SCREENSHOTS=off`) to save the minutes that drawing and encoding ~115 pictures (some 6,000 px tall) take.
 */
const SCREENSHOTS = process.env.E2E_SCREENSHOTS !== 'off';

export async function screenshot(page: Page, name: string): Promise<void> {
  if (!SCREENSHOTS) return;
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`), fullPage: true });
}

/**
 * The trip screens scroll inside the page, so a full-page shot shows only the first screenful. This one grows the
 * viewport to the tallest scrolling element first, so the whole screen can be reviewed, then restores it.
 */
export async function screenshotTall(page: Page, name: string): Promise<void> {
  if (!SCREENSHOTS) return;
  const viewport = page.viewportSize();
  const height = await page.evaluate(() =>
    Math.max(
      window.innerHeight,
      ...[...document.querySelectorAll('*')].map((el) =>
        el.scrollHeight > el.clientHeight + 4 ? el.scrollHeight + el.getBoundingClientRect().top : 0,
      ),
    ),
  );
  if (viewport) await page.setViewportSize({ width: viewport.width, height: Math.min(6000, Math.ceil(height) + 120) });
  await page.waitForTimeout(300);
  await screenshot(page, name);
  if (viewport) await page.setViewportSize(viewport);
}

/** A screenful with the element at its top (the trip tabs scroll inside the page, so full-page shots miss it). */
export async function shootAt(page: Page, testId: string, name: string): Promise<void> {
  fs.mkdirSync(SCREENSHOT_DIR, { recursive: true });
  await page.locator(byTestId(testId)).evaluate((el) => el.scrollIntoView({ block: 'start' }));
  if (!SCREENSHOTS) return;
  await page.waitForTimeout(200);
  await page.screenshot({ path: path.join(SCREENSHOT_DIR, `${name}.png`) });
}

/** Collects uncaught page errors so a test can assert that none happened. */
export function trackPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(error.message));
  return errors;
}

export const byTestId = (id: string) => `[data-testid="${id}"]`;

/** Signs in through the form and waits for the trips list. */
export async function signIn(page: Page, url: string, email: string, password: string): Promise<void> {
  await page.goto(url);
  await page.waitForSelector(byTestId('sign-in-screen'));
  await page.fill(byTestId('sign-in-email'), email);
  await page.fill(byTestId('sign-in-password'), password);
  await page.click(byTestId('sign-in-submit'));
  await page.waitForSelector(byTestId('trips-screen'));
}

/** Opens a trip from the list by its name and returns its id. */
export async function openTrip(page: Page, name: string): Promise<string> {
  await page.locator('[data-testid^="trip-open-"]').filter({ hasText: name }).first().click();
  await page.waitForSelector(byTestId('trip-frame'));
  const match = /\/trips\/([^/]+)/.exec(new URL(page.url()).pathname);
  if (!match?.[1]) throw new Error(`not on a trip page: ${page.url()}`);
  return match[1];
}

/** Runs axe on the page and returns the serious and critical violations, with where they were found. */
export async function seriousA11yViolations(page: Page): Promise<string[]> {
  const { default: AxeBuilder } = await import('@axe-core/playwright');
  const result = await new AxeBuilder({ page }).analyze();
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.id} (${v.impact}): ${v.nodes
          .slice(0, 3)
          .map((n) => n.target.join(' '))
          .join(' | ')}`,
    );
}

export type Suite = { server: RunningServer; browser: Browser };

/**
 * One real server and one browser for a test file: started before its first test, stopped after
 * its last. Read `suite.server` and `suite.browser` inside tests, once they are set.
 */
export function useServerAndBrowser(env: () => Record<string, string> = () => ({})): Suite {
  const suite = {} as Suite;
  beforeAll(async () => {
    suite.server = await startServer(env());
    suite.browser = await launchBrowser();
  });
  afterAll(async () => {
    await suite.browser?.close();
    await suite.server?.stop();
  });
  return suite;
}
