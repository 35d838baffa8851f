// Web benchmark on a slow campground link: headless Chromium (playwright-core, the system Chromium) with CDP network
// emulation (300 ms latency, 200 KB/s down, 94 KB/s up) against the real server serving the built app. Five runs,
// medians, of: the sign-in form visible (and usable) on a first visit; after signing in, a trip's budget headline
// and its chart drawn on a first visit; the chart after 20 s on the Trips screen first; and on a repeat visit.
// Targets are reported, not asserted (see README, "Speed"). The emulation slows the page's own requests only, not the
// service worker's: the app registers its worker once the chart's bytes are in, so the first visit's figures are the
// page's, and the worker's precache (mostly answered from the browser's cache) comes after them.
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { DEMO_ACCOUNT } from '../db/seed';
import { startServer } from '../tests/e2e/server-process';
import { ensureWebBuild } from './build-web';
import { browserPath } from './find-browser';
import { loadAverage } from './load-average';

const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const TRIP = 'Highland loop';
const SLOW_LINK = { offline: false, latency: 300, downloadThroughput: 200 * 1024, uploadThroughput: 94 * 1024 };
const byTestId = (id: string): string => `[data-testid="${id}"]`;
/** The chart has drawn once its canvas reports where its last point landed. */
const CHART_DRAWN = `${byTestId('soc-chart')} [data-plot-left]:not([data-last-x="0"])`;
const LONG = { timeout: 120_000 };

async function slowContext(browser: Browser): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  const cdp = await context.newCDPSession(page);
  await cdp.send('Network.enable');
  await cdp.send('Network.emulateNetworkConditions', SLOW_LINK);
  return { context, page };
}

const since = (start: number): number => (performance.now() - start) / 1000;

/** Seconds until the sign-in form is visible, and until it answers presses (the app has taken the page over). */
async function signIn(page: Page, url: string): Promise<{ visible: number; usable: number }> {
  const start = performance.now();
  // Not waiting for the page's load event: the form can show long before the scripts and fonts have arrived.
  await page.goto(url, { waitUntil: 'commit' });
  await page.waitForSelector(byTestId('sign-in-email'), { state: 'visible', ...LONG });
  const visible = since(start);
  await page.waitForSelector(`${byTestId('sign-in-submit')}:not([aria-disabled="true"])`, LONG);
  const usable = since(start);
  await page.fill(byTestId('sign-in-email'), DEMO_ACCOUNT.email);
  await page.fill(byTestId('sign-in-password'), DEMO_ACCOUNT.password);
  await page.click(byTestId('sign-in-submit'));
  await page.waitForSelector(byTestId('trips-screen'), LONG);
  await page.locator('[data-testid^="trip-open-"]').first().waitFor(LONG);
  return { visible, usable };
}

/** Opens the trip from the list; seconds until its headline figures and until its chart has drawn. */
async function openTrip(page: Page): Promise<{ headline: number; chart: number }> {
  const start = performance.now();
  await page.locator('[data-testid^="trip-open-"]').filter({ hasText: TRIP }).first().click();
  await page.waitForSelector(byTestId('headline-figures'), LONG);
  const headline = since(start);
  await page.waitForSelector(CHART_DRAWN, LONG);
  return { headline, chart: since(start) };
}

const median = (values: number[]): number => {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] ?? Number.NaN) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
};

async function main(): Promise<void> {
  // WEB_DIR names another export to measure (an older build, for a before/after table); by default dist/.
  if (!process.env.WEB_DIR) ensureWebBuild();
  console.log(`load average before: ${loadAverage()}; ${RUNS} runs`);
  const server = await startServer();
  const browser = await chromium.launch({
    executablePath: browserPath(),
    args: ['--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'],
  });
  const figures: Record<string, number[]> = {
    'sign-in form visible (first visit)': [],
    'sign-in form usable (first visit)': [],
    'budget headline (first visit to the trip)': [],
    'chart drawn (first visit to the trip)': [],
    'chart drawn after 20 s on Trips': [],
    'chart drawn on a repeat visit': [],
  };
  const add = (name: string, value: number): void => void figures[name]?.push(value);
  try {
    for (let run = 1; run <= RUNS; run += 1) {
      // First visit: an empty cache, straight from sign-in to the trip.
      const first = await slowContext(browser);
      const form = await signIn(first.page, server.url);
      add('sign-in form visible (first visit)', form.visible);
      add('sign-in form usable (first visit)', form.usable);
      const opened = await openTrip(first.page);
      add('budget headline (first visit to the trip)', opened.headline);
      add('chart drawn (first visit to the trip)', opened.chart);
      // Repeat visit: the same browser comes back to the trip page later, by when the app's service worker (which
      // registers once the chart's bytes are in) has installed.
      await first.page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
      const tripUrl = first.page.url();
      const start = performance.now();
      await first.page.goto(tripUrl);
      await first.page.waitForSelector(CHART_DRAWN, LONG);
      add('chart drawn on a repeat visit', since(start));
      await first.context.close();

      // A new browser that spends 20 s on the Trips screen before opening the trip.
      const waited = await slowContext(browser);
      await signIn(waited.page, server.url);
      await waited.page.waitForTimeout(20_000);
      add('chart drawn after 20 s on Trips', (await openTrip(waited.page)).chart);
      await waited.context.close();
      console.log(
        `run ${run}: ${Object.entries(figures)
          .map(([k, v]) => `${k} ${v.at(-1)?.toFixed(2)} s`)
          .join('; ')}`,
      );
    }
  } finally {
    await browser.close();
    await server.stop();
  }
  console.log('\n| slow link (300 ms, 200 KB/s down, 94 KB/s up) | median of runs, s |');
  console.log('|---|---|');
  for (const [name, values] of Object.entries(figures)) console.log(`| ${name} | ${median(values).toFixed(2)} |`);
  console.log(`load average after: ${loadAverage()}`);
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
