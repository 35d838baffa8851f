// Every screen at phone and laptop widths: a screenshot for review, an axe scan with no serious or critical
// violations, nothing wider than the window or its card, no text over other text, and the chart showing the
// whole trip. One signed-in context serves both widths (the window is resized between them) to keep this quick.
import fs from 'node:fs';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import type { BudgetResponse } from '@/shared/schemas/budget-response';
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
import { horizontalOverflow, overlappingText, tripChromeHeight } from './layout-probes';

const suite = useServerAndBrowser();

type Check = { name: string; trip?: boolean; open: (page: Page, paths: Paths) => Promise<void> };
type Paths = { trip: string; club: string; rig: string };

const go = async (page: Page, path: string, ready: string) => {
  await page.goto(`${suite.server.url}${path}`);
  await page.waitForSelector(byTestId(ready));
};

const tab =
  (testID: string, ready: string, extra?: (page: Page) => Promise<void>): Check['open'] =>
  async (page, paths) => {
    await go(page, paths.trip, 'trip-frame');
    await page.click(byTestId(testID));
    await page.waitForSelector(byTestId(ready));
    await extra?.(page);
  };

const chartDrawn = async (page: Page) => {
  await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
};

const CHECKS: Check[] = [
  {
    name: 'trips',
    open: async (page) => {
      await go(page, '/', 'trip-list');
      // The list never waits for a budget: a card says it is being worked out, and the figures follow.
      await page.waitForSelector('[data-testid^="trip-gauge-"]');
    },
  },
  { name: 'new-trip', open: (page) => go(page, '/trips/new', 'new-trip-rig-preset:van-small') },
  { name: 'clubs', open: (page) => go(page, '/clubs', 'club-list') },
  { name: 'club', open: (page, paths) => go(page, paths.club, 'club-trips-card') },
  { name: 'account', open: (page) => go(page, '/account', 'units-card') },
  { name: 'my-rigs', open: (page) => go(page, '/rigs', 'rigs-list') },
  { name: 'saved-rig', open: (page, paths) => go(page, paths.rig, 'rig-loads') },
  { name: 'budget', trip: true, open: tab('tab-budget', 'budget-screen', chartDrawn) },
  {
    name: 'budget-what-if',
    trip: true,
    open: tab('tab-budget', 'budget-screen', async (page) => {
      await page.click(byTestId('what-if-extraBattery'));
      await page.waitForSelector(byTestId('what-if-banner'));
      await chartDrawn(page);
    }),
  },
  { name: 'route', trip: true, open: tab('tab-route', 'route-screen') },
  {
    name: 'route-stop',
    trip: true,
    open: tab('tab-route', 'route-screen', async (page) => {
      await page.click(byTestId('stop-1-edit'));
      await page.waitForSelector(byTestId('sun-path'));
    }),
  },
  { name: 'loads', trip: true, open: tab('tab-loads', 'loads-screen') },
  {
    name: 'loads-routine',
    trip: true,
    open: tab('tab-loads', 'loads-screen', async (page) => {
      await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'Hair dryer' }).first().click();
      await page.waitForSelector(byTestId('routine-strip'));
    }),
  },
  { name: 'rig', trip: true, open: tab('tab-rig', 'rig-form') },
  { name: 'people', trip: true, open: tab('tab-people', 'members') },
  { name: 'ledger', trip: true, open: tab('tab-ledger', 'ledger-list') },
];

/** The first and last local hour of the budget, as the chart's caption prints them. */
async function tripHours(page: Page, tripId: string): Promise<{ first: string; last: string }> {
  const response = await page.request.get(`${suite.server.url}/api/trips/${tripId}/budget`);
  const body = (await response.json()) as BudgetResponse;
  const hours = body.result?.soc.local ?? [];
  return { first: hours[0] ?? '', last: hours[hours.length - 1] ?? '' };
}

/** The chart's plot edges and where the drawn range's first and last hours fall, px (published by the canvas). */
async function plotReach(page: Page) {
  const canvasBox = page.locator(`${byTestId('soc-chart')} [data-plot-left]`).first();
  await expect.poll(() => canvasBox.getAttribute('data-last-x')).not.toBe('0');
  return canvasBox.evaluate((el) => {
    const d = (el as HTMLElement).dataset;
    return {
      plotLeft: Number(d.plotLeft),
      plotRight: Number(d.plotRight),
      firstX: Number(d.firstX),
      lastX: Number(d.lastX),
    };
  });
}

describe('every screen', () => {
  it('when each screen is opened at phone and laptop widths, then nothing overflows or overlaps and axe finds nothing serious', async () => {
    // axe needs a page from an explicit context.
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone, acceptDownloads: true });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    const problems: string[] = [];
    const layout = async (name: string) => {
      for (const p of await horizontalOverflow(page)) problems.push(`${name}: ${p}`);
      for (const p of await overlappingText(page)) problems.push(`${name}: ${p}`);
    };

    // The chart's bytes: none while signed out; once signed in, the wasm and the chart's chunk are fetched at idle
    // on the Trips screen, so a trip opened later draws at once.
    const chartRequests: string[] = [];
    page.on('request', (r) => {
      const url = r.url();
      if (/\/canvaskit-[0-9a-f]+\.wasm$/.test(url)) chartRequests.push('wasm');
      else if (/\/soc-chart-chunk[^/]*\.js$/.test(url)) chartRequests.push('chart chunk');
    });

    // Signed out first: the sign-in screen at both widths.
    for (const [size, viewport] of Object.entries(VIEWPORTS)) {
      await page.setViewportSize(viewport);
      await go(page, '/', 'sign-in-screen');
      await layout(`sign-in ${size}`);
      await screenshotTall(page, `screen-sign-in-${size}`);
    }

    expect(chartRequests).toEqual([]);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await expect.poll(() => [...new Set(chartRequests)].sort(), { timeout: 15_000 }).toEqual(['chart chunk', 'wasm']);
    const tripId = await openTrip(page, 'Highland loop');
    const headers = { Origin: suite.server.url };
    const club = await page.request.post(`${suite.server.url}/api/clubs`, { data: { name: 'Loch rally' }, headers });
    const clubId = ((await club.json()) as { club: { id: string } }).club.id;
    await page.request.post(`${suite.server.url}/api/clubs/${clubId}/trips`, { data: { tripId }, headers });
    const saved = await page.request.post(`${suite.server.url}/api/trips/${tripId}/rig/save`, {
      data: { name: 'Our touring van' },
      headers,
    });
    const rigId = ((await saved.json()) as { rig: { id: string } }).rig.id;
    const paths: Paths = { trip: `/trips/${tripId}`, club: `/clubs/${clubId}`, rig: `/rigs/${rigId}` };
    const hours = await tripHours(page, tripId);

    const violations: string[] = [];
    for (const [size, viewport] of Object.entries(VIEWPORTS)) {
      await page.setViewportSize(viewport);
      for (const check of CHECKS) {
        await check.open(page, paths);
        await page.waitForTimeout(200);
        const name = `${check.name} ${size}`;
        await layout(name);
        if (check.trip && size === 'phone') {
          const chrome = await tripChromeHeight(page);
          if (chrome > 0.2 * viewport.height) problems.push(`${name}: header and bars take ${Math.round(chrome)} px`);
        }
        if (check.name === 'budget') {
          // The chart shows the whole trip by default: its range starts at the first hour and ends at the last.
          const chart = page.locator(byTestId('soc-chart'));
          const drawn = [await chart.getAttribute('data-from'), await chart.getAttribute('data-to')];
          if (drawn[0] !== hours.first || drawn[1] !== hours.last)
            problems.push(
              `${name}: the chart draws ${drawn.join(' to ')}, the trip runs ${hours.first} to ${hours.last}`,
            );
          // ...and those hours land on the plot's edges, not past them.
          const plot = await plotReach(page);
          if (Math.abs(plot.firstX - plot.plotLeft) > 1 || Math.abs(plot.lastX - plot.plotRight) > 1)
            problems.push(
              `${name}: the trip spans ${plot.firstX}–${plot.lastX} px of a plot ${plot.plotLeft}–${plot.plotRight} px`,
            );
        }
        await screenshotTall(page, `screen-${check.name}-${size}`);
        for (const v of await seriousA11yViolations(page)) violations.push(`${name}: ${v}`);
      }
    }
    // Joined so a failure lists every problem, not the first few.
    expect(problems.join('\n')).toBe('');
    expect(violations).toEqual([]);
    expect(errors).toEqual([]);

    // On a phone the trip's tab row says that it scrolls, and the last tabs can be reached.
    await page.setViewportSize(VIEWPORTS.phone);
    await go(page, paths.trip, 'trip-frame');
    await page.waitForSelector(byTestId('trip-tabs-more-right'));
    await page.click(byTestId('trip-tabs-more-right'));
    await page.click(byTestId('tab-ledger'));
    await page.waitForSelector(byTestId('ledger-list'));
    await page.waitForSelector(byTestId('trip-tabs-more-left'));

    // Pointing at the chart shows that hour's figures; the hour buttons do the same from a keyboard.
    await page.setViewportSize(VIEWPORTS.desktop);
    await CHECKS.find((c) => c.name === 'budget')?.open(page, paths);
    const canvas = page.locator(`${byTestId('soc-chart')} canvas`).first();
    await canvas.scrollIntoViewIfNeeded();
    const box = await canvas.boundingBox();
    if (!box) throw new Error('no chart canvas');
    await page.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
    // Place and charge come with the budget; the hour's other figures arrive with the ledger, fetched on first use.
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ % · solar .+ available/);
    await page.click(byTestId('soc-next-hour'));
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ %/);

    // Zooming into one day narrows the drawn range to that day; "All" brings the whole trip back.
    await page.click(byTestId('soc-range-day-1'));
    await expect
      .poll(() => page.locator(byTestId('soc-chart')).getAttribute('data-from'))
      .toMatch(/^\d{4}-\d{2}-\d{2}T00:00/);
    await page.click(byTestId('soc-range-all'));
    await expect.poll(() => page.locator(byTestId('soc-chart')).getAttribute('data-to')).toBe(hours.last);

    // A routine window's start and length are set apart, and the window is said in words. Saving shows a toast that
    // covers no button.
    await CHECKS.find((c) => c.name === 'loads-routine')?.open(page, paths);
    const words = () => page.textContent(byTestId('window-0-words'));
    await expect.poll(words).toBe('07:30–07:40, 10 min, camp days');
    await page.fill(byTestId('window-minutes-0'), '15');
    await expect.poll(words).toBe('07:30–07:45, 15 min, camp days');
    await page.fill(byTestId('window-start-0'), '07:45');
    await expect.poll(words).toBe('07:45–08:00, 15 min, camp days');
    await expect.poll(() => page.textContent(byTestId('routine-preview-words'))).toContain('07:45–08:00, 15 min');
    await page.click(byTestId('schedule-save'));
    await page.waitForSelector(byTestId('toast'));
    const covered = await page.evaluate(() => {
      const toast = document.querySelector('[data-testid="toast"]')?.getBoundingClientRect();
      if (!toast) return ['no toast'];
      return [...document.querySelectorAll('[role="button"], button, a')]
        .filter((el) => !el.closest('[data-testid="toast"]'))
        .filter((el) => {
          const r = el.getBoundingClientRect();
          return (
            r.width > 0 && r.left < toast.right && r.right > toast.left && r.top < toast.bottom && r.bottom > toast.top
          );
        })
        .map((el) => el.getAttribute('aria-label') ?? el.textContent ?? '');
    });
    expect(covered).toEqual([]);

    // The hourly ledger downloads as CSV with a header row.
    await page.click(byTestId('tab-ledger'));
    await page.click(byTestId('ledger-short-short'));
    const [download] = await Promise.all([page.waitForEvent('download'), page.click(byTestId('ledger-csv'))]);
    const csv = fs.readFileSync(await download.path(), 'utf8');
    expect(csv.split('\r\n')[0]).toContain('state of charge %');
    expect(csv.split('\r\n').length).toBeGreaterThan(2);
    await context.close();
  }, 300_000);
});
