// Offline after a first visit: the service worker serves the app, the saved query cache brings back the trip with its
// budget, chart and ledger, and a banner says the device is offline and how old the data is.
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, openTrip, screenshotTall, signIn, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

describe('offline', () => {
  it('when a trip was opened once and the phone goes offline, then the trip, its budget, chart and ledger open again', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone, timezoneId: 'Europe/London' });
    const page = await context.newPage();
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const tripUrl = `${suite.server.url}/trips/${await openTrip(page, 'Highland loop')}`;
    await page.waitForSelector(byTestId('budget-screen'));
    await page.waitForSelector(byTestId('soc-chart'));
    await page.click(byTestId('tab-ledger'));
    await page.waitForSelector(byTestId('ledger-screen'));
    // The worker has installed (precache done) and controls the page; the query cache is written a moment later.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
    });
    await page.waitForFunction(() => !!navigator.serviceWorker.controller);
    await page.waitForTimeout(1500);

    await context.setOffline(true);
    const started = Date.now();
    await page.goto(tripUrl);
    await page.waitForSelector(byTestId('budget-screen'));
    const firstLoadMs = Date.now() - started;
    await page.waitForSelector(byTestId('offline-banner'));
    expect(await page.textContent(byTestId('offline-banner'))).toMatch(/saved (just now|\d+ min ago)/);
    await page.waitForSelector(byTestId('soc-chart'));
    await page.click(byTestId('tab-ledger'));
    await page.waitForSelector(byTestId('ledger-screen'));
    await screenshotTall(page, 'offline-ledger-phone');
    console.log(`Offline first load of a cached trip: ${firstLoadMs} ms`);
    await context.close();
  });
});
