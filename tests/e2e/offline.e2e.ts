// Offline after a first visit: the service worker serves the app, the saved query cache brings back the trip with its
// budget, chart and ledger, and a banner says the device is offline and how old the data is. Changes made with no
// signal are kept on the device (through a reload too) and sent once it returns; one that meets a newer edit by
// another member opens the conflict notice with what was set still there.
import type { APIRequestContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT, DEMO_CREW } from '@/db/seed';
import type { ApplianceRecord, TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { byTestId, openTrip, screenshotTall, signIn, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

/** How many kept changes the page has written to IndexedDB (the persister writes a moment after a change). */
const keptOnDevice = (page: Page) =>
  page.evaluate(
    () =>
      new Promise<number>((resolve, reject) => {
        const open = indexedDB.open('keyval-store');
        open.onerror = () => reject(open.error);
        open.onsuccess = () => {
          const read = open.result.transaction('keyval').objectStore('keyval').get('trailtally-queries');
          read.onsuccess = () =>
            resolve(read.result ? (JSON.parse(read.result as string).clientState.mutations.length as number) : 0);
        };
      }),
  );

/** Another member of the trip, talking to the API directly. */
async function signInOverApi(url: string, email: string, password: string) {
  const context = await suite.browser.newContext();
  const response = await context.request.post(`${url}/api/auth/sign-in/email`, {
    data: { email, password },
    headers: { Origin: url },
  });
  expect(response.status()).toBe(200);
  return { api: context.request, close: () => context.close() };
}

const laptopOf = async (api: APIRequestContext, url: string, tripId: string): Promise<ApplianceRecord> => {
  const detail = (await (await api.get(`${url}/api/trips/${tripId}`)).json()) as TripDetail;
  const laptop = detail.appliances.find((a) => a.appliance.name === 'Laptop');
  if (!laptop) throw new Error('the demo trip has no Laptop');
  return laptop;
};

async function openLaptopRoutine(page: Page): Promise<void> {
  await page.click(byTestId('tab-loads'));
  await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'Laptop' }).first().click();
  await page.waitForSelector(byTestId('routine-strip'));
  await page.locator(byTestId('routine-strip-cell-13')).scrollIntoViewIfNeeded();
}

describe('offline', () => {
  it('when a trip was opened once and the phone goes offline, then it opens, keeps a check-in and a routine change, and sends them once back online', async () => {
    const url = suite.server.url;
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone, timezoneId: 'Europe/London' });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const tripId = await openTrip(page, 'Highland loop');
    const tripUrl = `${url}/trips/${tripId}`;
    await page.waitForSelector(byTestId('budget-screen'));
    await page.waitForSelector(byTestId('soc-chart'));
    await page.click(byTestId('tab-ledger'));
    await page.waitForSelector(byTestId('ledger-screen'));
    await page.click(byTestId('tab-check-in'));
    await page.waitForSelector(byTestId('road-screen'));
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

    // With no signal: a check-in, listed at once as waiting, and a longer laptop routine.
    await page.click(byTestId('tab-check-in'));
    await page.fill(byTestId('check-in-soc'), '71');
    await page.fill(byTestId('check-in-time'), '2027-09-14 19:00');
    await page.fill(byTestId('check-in-note'), 'Read at camp, no signal');
    await page.click(byTestId('check-in-save'));
    await page.waitForSelector(byTestId('check-in-kept'));
    await page.waitForSelector(byTestId('check-in-kept-0-waiting'));
    await openLaptopRoutine(page);
    expect(await page.getAttribute(byTestId('routine-strip-cell-13'), 'aria-checked')).toBe('false');
    await page.click(byTestId('routine-strip-cell-13'));
    await page.click(byTestId('schedule-save'));
    await expect
      .poll(() => page.textContent(byTestId('sync-waiting')), { timeout: 10_000 })
      .toContain('2 changes waiting to sync');
    await screenshotTall(page, 'offline-changes-waiting-phone');

    // Still offline, the page reloads: the two changes come back from the device.
    await expect.poll(() => keptOnDevice(page), { timeout: 10_000 }).toBe(2);
    await page.reload();
    await expect
      .poll(() => page.textContent(byTestId('sync-waiting')), { timeout: 10_000 })
      .toContain('2 changes waiting to sync');

    // Meanwhile another member changes the same routine.
    const { api: crew, close: closeCrew } = await signInOverApi(url, DEMO_CREW.email, DEMO_CREW.password);
    const before = await laptopOf(crew, url, tripId);
    const theirs = await crew.put(`${url}/api/trips/${tripId}/appliances/${before.id}/schedule`, {
      data: { version: before.version, schedule: { kind: 'always' } },
      headers: { Origin: url },
    });
    expect(theirs.status()).toBe(200);

    await context.setOffline(false);
    // The check-in reaches the server; the routine meets the newer version and waits for a choice.
    await expect
      .poll(
        async () => {
          const list = (await (await crew.get(`${url}/api/trips/${tripId}/check-ins`)).json()) as {
            checkIns: CheckInRecord[];
          };
          return list.checkIns.map((c) => `${c.checkIn.socPct} ${c.checkIn.note}`);
        },
        { timeout: 20_000 },
      )
      .toContain('71 Read at camp, no signal');
    await page.waitForSelector(byTestId('sync-waiting'), { state: 'detached', timeout: 20_000 });
    await openLaptopRoutine(page);
    await page.waitForSelector(byTestId('schedule-conflict'));
    // Nothing set offline was lost: the lit hour is still lit.
    await expect
      .poll(() => page.getAttribute(byTestId('routine-strip-cell-13'), 'aria-checked'), { timeout: 10_000 })
      .toBe('true');
    await screenshotTall(page, 'offline-conflict-phone');
    await page.click(byTestId('schedule-conflict-keep-mine'));
    await page.waitForSelector(byTestId('schedule-conflict'), { state: 'detached' });
    await expect
      .poll(async () => (await laptopOf(crew, url, tripId)).appliance.schedule.kind, { timeout: 10_000 })
      .toBe('routine');
    expect(errors).toEqual([]);
    await closeCrew();
    await context.close();
    // A long journey (first visit, offline reload, changes, a reload, back online): twice the usual time on a busy machine.
  }, 120_000);
});
