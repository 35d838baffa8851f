// The sweep shared by the phone and laptop screen tests: every screen opened in turn, screenshotted for review,
// scanned by axe for serious or critical violations, and probed for anything wider than the window or its card, text
// over other text, and (on the Budget tab) a chart that leaves out part of the trip. Split by width into two files so
// the browser tests' two workers share the work.
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import type { BudgetResponse } from '@/shared/schemas/budget-response';
import { byTestId, openTrip, screenshotTall, seriousA11yViolations, signIn, type Suite, VIEWPORTS } from './harness';
import { horizontalOverflow, overlappingText, tripChromeHeight } from './layout-probes';

export type Paths = { base: string; trip: string; club: string; rig: string };
export type Check = { name: string; trip?: boolean; open: (page: Page, paths: Paths) => Promise<void> };
export type Size = keyof typeof VIEWPORTS;

export const go = async (page: Page, url: string, ready: string) => {
  await page.goto(url);
  await page.waitForSelector(byTestId(ready));
};

const tab =
  (testID: string, ready: string, extra?: (page: Page) => Promise<void>): Check['open'] =>
  async (page, paths) => {
    await go(page, paths.base + paths.trip, 'trip-frame');
    await page.click(byTestId(testID));
    await page.waitForSelector(byTestId(ready));
    await extra?.(page);
  };

const chartDrawn = async (page: Page) => {
  await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
};

const at =
  (path: (paths: Paths) => string, ready: string): Check['open'] =>
  (page, paths) =>
    go(page, paths.base + path(paths), ready);

export const CHECKS: Check[] = [
  {
    name: 'trips',
    open: async (page, paths) => {
      await go(page, `${paths.base}/`, 'trip-list');
      // The list never waits for a budget: a card says it is being worked out, and the figures follow.
      await page.waitForSelector('[data-testid^="trip-gauge-"]');
    },
  },
  { name: 'new-trip', open: at(() => '/trips/new', 'new-trip-rig-preset:van-small') },
  { name: 'clubs', open: at(() => '/clubs', 'club-list') },
  { name: 'club', open: at((p) => p.club, 'club-trips-card') },
  { name: 'account', open: at(() => '/account', 'units-card') },
  { name: 'my-rigs', open: at(() => '/rigs', 'rigs-list') },
  { name: 'saved-rig', open: at((p) => p.rig, 'rig-loads') },
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

export const openCheck = (name: string, page: Page, paths: Paths): Promise<void> => {
  const check = CHECKS.find((c) => c.name === name);
  if (!check) throw new Error(`no screen check named ${name}`);
  return check.open(page, paths);
};

/** The first and last local hour of the budget, as the chart's caption prints them. */
async function tripHours(page: Page, base: string, tripId: string): Promise<{ first: string; last: string }> {
  const response = await page.request.get(`${base}/api/trips/${tripId}/budget`);
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

export type Sweep = { page: Page; paths: Paths; hours: { first: string; last: string }; problems: string[] };

/**
 * Signs the demo account in (after sweeping the sign-in screen), shares its Highland trip to a club and saves its rig
 * so those screens have something to show, then sweeps every screen at one width. Problems and axe violations are
 * collected, not thrown, so a failure lists all of them.
 */
export async function sweepScreens(
  suite: Suite,
  page: Page,
  size: Size,
  beforeSignIn: () => void = () => {},
  afterSignIn: () => Promise<void> = async () => {},
): Promise<Sweep & { violations: string[] }> {
  const viewport = VIEWPORTS[size];
  const base = suite.server.url;
  const problems: string[] = [];
  const violations: string[] = [];
  const layout = async (name: string) => {
    for (const p of await horizontalOverflow(page)) problems.push(`${name}: ${p}`);
    for (const p of await overlappingText(page)) problems.push(`${name}: ${p}`);
  };

  await page.setViewportSize(viewport);
  await go(page, `${base}/`, 'sign-in-screen');
  await layout(`sign-in ${size}`);
  await screenshotTall(page, `screen-sign-in-${size}`);
  beforeSignIn();
  await signIn(page, base, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
  await afterSignIn();

  const tripId = await openTrip(page, 'Highland loop');
  const headers = { Origin: base };
  const club = await page.request.post(`${base}/api/clubs`, { data: { name: 'Loch rally' }, headers });
  const clubId = ((await club.json()) as { club: { id: string } }).club.id;
  await page.request.post(`${base}/api/clubs/${clubId}/trips`, { data: { tripId }, headers });
  const saved = await page.request.post(`${base}/api/trips/${tripId}/rig/save`, {
    data: { name: 'Our touring van' },
    headers,
  });
  const rigId = ((await saved.json()) as { rig: { id: string } }).rig.id;
  const paths: Paths = { base, trip: `/trips/${tripId}`, club: `/clubs/${clubId}`, rig: `/rigs/${rigId}` };
  const hours = await tripHours(page, base, tripId);

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
        problems.push(`${name}: the chart draws ${drawn.join(' to ')}, the trip runs ${hours.first} to ${hours.last}`);
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
  return { page, paths, hours, problems, violations };
}
