// Weather records in the browser, against the local weather fake the development server starts: each stop of a
// trip opened for the first time shows its record loading on the Route tab, then the Budget tab leads with the
// chance the plan holds over 20 past years. Checked at phone and laptop widths.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import {
  byTestId,
  openTrip,
  screenshotTall,
  shootAt,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const suite = useServerAndBrowser();

async function noSidewaysScroll(page: Page): Promise<void> {
  const widths = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    inner: window.innerWidth,
  }));
  expect(widths.scroll).toBeLessThanOrEqual(widths.inner);
}

describe('weather records', () => {
  it('when a trip is opened for the first time, then its stops show their record loading, then the Budget tab says in how many of 20 years it holds', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await openTrip(page, 'Highland loop');
    await page.click(byTestId('tab-route'));
    await page.waitForSelector(byTestId('stop-0-sky'));
    await page.waitForFunction(
      (sel) => /Weather record: loading/.test(document.querySelector(sel)?.textContent ?? ''),
      byTestId('stop-3-sky'),
      { timeout: 20_000 },
    );
    await shootAt(page, 'stop-0', 'weather-route-loading-desktop');

    await page.waitForFunction(
      (sel) => /Sky from the record: 20 past years/.test(document.querySelector(sel)?.textContent ?? ''),
      byTestId('stop-3-sky'),
      { timeout: 90_000 },
    );
    await shootAt(page, 'stop-0', 'weather-route-ready-desktop');

    await page.click(byTestId('tab-budget'));
    await page.waitForFunction(
      (sel) => /Holds in \d+ of 20 past years/.test(document.querySelector(sel)?.textContent ?? ''),
      byTestId('plan-chance-headline'),
      { timeout: 60_000 },
    );
    expect(await page.textContent(byTestId('plan-chance'))).toContain('Worst year');
    // The chart draws the median year with the band of past years around it.
    await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
    await page.waitForTimeout(1500);
    await noSidewaysScroll(page);
    await screenshotTall(page, 'weather-budget-desktop');

    await page.setViewportSize(VIEWPORTS.phone);
    await page.waitForTimeout(300);
    await noSidewaysScroll(page);
    await shootAt(page, 'plan-chance', 'weather-budget-phone');
    await page.click(byTestId('tab-route'));
    await page.waitForSelector(byTestId('stop-0-sky'));
    await noSidewaysScroll(page);
    await shootAt(page, 'stop-0', 'weather-route-phone');
    expect(errors).toEqual([]);
    await context.close();
    // Eighty requests at the fetcher's pace of four a second, then the budget: longer than a browser test's default.
  }, 180_000);
});
