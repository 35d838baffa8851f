// Weather records in the browser, against the local weather fake the development server starts: each stop of a
// trip opened for the first time shows its record loading on the Route tab, then the Budget tab leads with the
// chance the plan holds over 20 past years. Checked at phone and laptop widths. A stop added through the form then
// shows its own record loading, and the budget and "what it would take" speak of its 20 years.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import type { TripDetail } from '@/shared/schemas/api';
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

  it('when a stop is added through the stop form, then its record shows loading, then the Budget tab says in how many of 20 years it holds', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    // The trip and a load through the API; the stop, the part under test, through the form.
    const post = async <T>(path: string, data: unknown): Promise<T> =>
      (await (
        await page.request.post(`${suite.server.url}${path}`, { data, headers: { Origin: suite.server.url } })
      ).json()) as T;
    const trip = await post<TripDetail>('/api/trips', {
      name: 'Glen Nevis weekend',
      startDate: '2027-07-02',
      endDate: '2027-07-04',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
    });
    await post(`/api/trips/${trip.trip.id}/appliances`, {
      appliance: {
        name: 'Fridge',
        circuit: 'dc',
        quantity: 1,
        runningW: 45,
        standbyW: 0,
        dutyCycle: 0.4,
        heatInputW: 0,
        schedule: { kind: 'always' },
      },
    });
    await page.goto(`${suite.server.url}/trips/${trip.trip.id}/route`);
    await page.click(byTestId('stop-add'));
    await page.waitForSelector(byTestId('stop-form'));
    await page.fill(byTestId('stop-name'), 'Glen Nevis pitch');
    // A place none of the other trips stop at, so its record is fetched now.
    await page.fill(byTestId('stop-lat'), '56.81');
    await page.fill(byTestId('stop-lon'), '-5.07');
    expect(await page.getAttribute(byTestId('stop-sky-source-record'), 'aria-checked')).toBe('true');
    await page.click(byTestId('stop-save'));
    await page.waitForSelector(byTestId('stop-form'), { state: 'detached' });
    const sky = page.locator(byTestId('stop-0-sky'));
    await expect.poll(() => sky.textContent(), { timeout: 20_000 }).toMatch(/Weather record: loading/);
    await expect.poll(() => sky.textContent(), { timeout: 30_000 }).toMatch(/Sky from the record: 20 past years/);

    await page.click(byTestId('tab-budget'));
    const headline = page.locator(byTestId('plan-chance-headline'));
    await expect.poll(() => headline.textContent(), { timeout: 30_000 }).toMatch(/Holds in \d+ of 20 past years/);
    await expect
      .poll(() => page.textContent(byTestId('what-it-would-take')), { timeout: 30_000 })
      .toMatch(/9 of 10 past years/);
    expect(errors).toEqual([]);
    await context.close();
  }, 90_000);
});
