// Every screen at phone and laptop widths: a screenshot for review and an axe scan with no serious or
// critical violations.
import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import {
  byTestId,
  openTrip,
  screenshotTall,
  seriousA11yViolations,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const suite = useServerAndBrowser();

type Check = { name: string; open: (page: Page, tripPath: string) => Promise<void> };

const tab =
  (testID: string, ready: string, extra?: (page: Page) => Promise<void>): Check['open'] =>
  async (page, tripPath) => {
    await page.goto(`${suite.server.url}${tripPath}`);
    await page.waitForSelector(byTestId('trip-frame'));
    await page.click(byTestId(testID));
    await page.waitForSelector(byTestId(ready));
    await extra?.(page);
  };

const CHECKS: Check[] = [
  {
    name: 'trips',
    open: async (page) => {
      await page.goto(suite.server.url);
      await page.waitForSelector(byTestId('trip-list'));
      // The list never waits for a budget: a card says it is being worked out, and the figures follow.
      await page.waitForSelector('[data-testid^="trip-gauge-"]');
    },
  },
  {
    name: 'new-trip',
    open: async (page) => {
      await page.click(byTestId('new-trip'));
      await page.waitForSelector(byTestId('new-trip-rig-preset:van-small'));
    },
  },
  {
    name: 'account',
    open: async (page) => {
      await page.goto(`${suite.server.url}/account`);
      await page.waitForSelector(byTestId('units-card'));
    },
  },
  {
    name: 'budget',
    open: tab('tab-budget', 'budget-screen', async (page) => {
      await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
    }),
  },
  {
    name: 'budget-what-if',
    open: tab('tab-budget', 'budget-screen', async (page) => {
      await page.click(byTestId('what-if-extraBattery'));
      await page.waitForSelector(byTestId('what-if-banner'));
      await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
    }),
  },
  { name: 'route', open: tab('tab-route', 'route-screen') },
  {
    name: 'route-stop',
    open: tab('tab-route', 'route-screen', async (page) => {
      await page.click(byTestId('stop-1-edit'));
      await page.waitForSelector(byTestId('sun-path'));
    }),
  },
  { name: 'loads', open: tab('tab-loads', 'loads-screen') },
  {
    name: 'loads-routine',
    open: tab('tab-loads', 'loads-screen', async (page) => {
      await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'Hair dryer' }).first().click();
      await page.waitForSelector(byTestId('routine-strip'));
    }),
  },
  { name: 'rig', open: tab('tab-rig', 'rig-form') },
  { name: 'people', open: tab('tab-people', 'members') },
  { name: 'ledger', open: tab('tab-ledger', 'ledger-list') },
];

describe.each(Object.entries(VIEWPORTS))('at %s width', (size, viewport) => {
  it('when each screen is opened, then it renders without errors and axe finds nothing serious', async () => {
    // axe needs a page from an explicit context.
    const context = await suite.browser.newContext({ viewport, acceptDownloads: true });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    // The chart's Skia chunk and canvaskit.wasm load only when a chart is on screen.
    const chartRequests: string[] = [];
    page.on('request', (r) => {
      if (/canvaskit\.wasm|soc-chart-canvas/.test(r.url())) chartRequests.push(r.url());
    });
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    expect(chartRequests).toEqual([]);
    await openTrip(page, 'Highland loop');
    const tripPath = new URL(page.url()).pathname;
    await page.goto(suite.server.url);
    const violations: string[] = [];
    chartRequests.length = 0;
    for (const check of CHECKS) {
      await check.open(page, tripPath);
      if (check.name === 'account') expect(chartRequests).toEqual([]);
      await page.waitForTimeout(200);
      await screenshotTall(page, `screen-${check.name}-${size}`);
      for (const v of await seriousA11yViolations(page)) violations.push(`${check.name}: ${v}`);
    }
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);

    // Pointing at the chart shows that hour's figures; the hour buttons do the same from a keyboard.
    await CHECKS[3]?.open(page, tripPath);
    const canvas = page.locator(`${byTestId('soc-chart')} canvas`).first();
    await canvas.scrollIntoViewIfNeeded();
    const box = await canvas.boundingBox();
    if (!box) throw new Error('no chart canvas');
    await page.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ %/);
    await page.click(byTestId('soc-next-hour'));
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ %/);

    // The hourly ledger downloads as CSV with a header row.
    await page.click(byTestId('tab-ledger'));
    await page.click(byTestId('ledger-short-short'));
    const [download] = await Promise.all([page.waitForEvent('download'), page.click(byTestId('ledger-csv'))]);
    const file = await download.path();
    const csv = fs.readFileSync(file, 'utf8');
    expect(csv.split('\r\n')[0]).toContain('state of charge %');
    expect(csv.split('\r\n').length).toBeGreaterThan(2);
    await context.close();
  });
});
