// Checking in on the road, at phone width and at laptop width: the reading is saved, listed with who took it, and the
// forecast from it heads both the Check in tab and the Budget tab; readings that disagree with the plan offer a
// calibration that is accepted and undone; a viewer sees the readings but no form.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT, DEMO_VIEWER } from '@/db/seed';
import type { TripDetail } from '@/shared/schemas/api';
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
import { horizontalOverflow, overlappingText } from './layout-probes';

const suite = useServerAndBrowser();
const HEADLINE = /^From your check-in Tue 18:00 at 68 %: lowest ahead \d+ % on [A-Z][a-z]{2} \d{2}:\d{2}$/;

async function openCheckIn(page: Page): Promise<string> {
  const tripId = await openTrip(page, 'Highland loop');
  await page.click(byTestId('tab-check-in'));
  await page.waitForSelector(byTestId('road-screen'));
  return tripId;
}

/** When the trip's last stop is left, as the server has it. */
const lastDeparture = async (page: Page, tripId: string) => {
  const detail = (await (await page.request.get(`${suite.server.url}/api/trips/${tripId}`)).json()) as TripDetail;
  return Date.parse(detail.stops.at(-1)?.stop.departAt ?? '');
};

async function expectTidy(page: Page, name: string): Promise<void> {
  expect(await horizontalOverflow(page)).toEqual([]);
  expect(await overlappingText(page)).toEqual([]);
  expect(await seriousA11yViolations(page)).toEqual([]);
  await screenshotTall(page, name);
}

async function checkIn(page: Page, time: string, socPct: number): Promise<void> {
  await page.locator(byTestId('check-in-soc')).scrollIntoViewIfNeeded();
  await page.fill(byTestId('check-in-soc'), String(socPct));
  await page.fill(byTestId('check-in-time'), time);
  await page.click(byTestId('check-in-save'));
  await expect.poll(() => page.textContent(byTestId('check-in-list')), { timeout: 10_000 }).toContain(`${socPct} %`);
}

const headline = async (page: Page) => (await page.textContent(byTestId('reforecast-headline')))?.trim() ?? '';
const shown = async (page: Page, testId: string) => (await page.textContent(byTestId(testId)))?.trim() ?? '';

/** Calibrate from the check-ins: the before/after agrees with the headline, Accept changes it, Undo puts it back. */
async function useWhatWeSaw(page: Page): Promise<void> {
  await page.locator(byTestId('calibrate-open')).scrollIntoViewIfNeeded();
  const before = await headline(page);
  expect(before).toMatch(/^From your check-in Wed 18:00 at 16 %: lowest ahead \d+ % on [A-Z][a-z]{2} \d{2}:\d{2}$/);
  expect(await shown(page, 'calibrate-reason')).toMatch(/miss the plan by \d+\.\d % of the bank/);
  await page.click(byTestId('calibrate-open'));
  await page.waitForSelector(byTestId('calibrate-result'), { timeout: 20_000 });
  // "Now" is the figure the headline already says; the calibrated forecast is what the headline will say.
  const nowAhead = (await shown(page, 'calibrate-lowestAhead-before')).replace(/^Now: /, '');
  const fittedAhead = (await shown(page, 'calibrate-lowestAhead-after')).replace(/^Calibrated: /, '');
  expect(before.endsWith(`: ${nowAhead}`)).toBe(true);
  expect(await shown(page, 'calibrate-openness-before')).toBe('Now: 5.5 % open');
  expect(await shown(page, 'calibrate-loads-before')).toBe('Now: loads ×1.00 (±0 %)');
  expect(await shown(page, 'calibrate-loads-after')).toMatch(/^Calibrated: loads ×0\.\d\d \(−\d+ %\)$/);
  const errorBefore = Number.parseFloat((await shown(page, 'calibrate-fitError-before')).replace(/^Now: /, ''));
  const errorAfter = Number.parseFloat((await shown(page, 'calibrate-fitError-after')).replace(/^Calibrated: /, ''));
  expect(errorAfter).toBeLessThan(errorBefore);
  await page.locator(byTestId('calibrate-result')).scrollIntoViewIfNeeded();
  await expectTidy(page, 'check-in-calibrate-phone');

  await page.click(byTestId('calibrate-accept'));
  await expect.poll(() => page.textContent(byTestId('toast')), { timeout: 10_000 }).toContain('Saved: calibrated');
  await expect.poll(() => headline(page), { timeout: 5_000 }).toBe(before.replace(nowAhead, fittedAhead));
  // The readings now agree with the plan: nothing more to offer.
  expect(await page.locator(byTestId('calibrate-card')).count()).toBe(0);

  await page.click(byTestId('toast-action'));
  await expect.poll(() => headline(page), { timeout: 10_000 }).toBe(before);
  await page.waitForSelector(byTestId('calibrate-open'));
}

describe('check-ins', () => {
  it('when a planner checks in on a phone, then the reading is listed with its author, the forecast starts from it on both tabs, a night more at the current stop shows at once and is kept, and readings that disagree calibrate the plan until undone', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone, timezoneId: 'Europe/London' });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const tripId = await openCheckIn(page);
    await page.waitForSelector(byTestId('check-in-list-empty'));

    // A message beside the field when the charge is missing.
    await page.click(byTestId('check-in-save'));
    await page.waitForSelector('text=Enter the state of charge the battery monitor shows.');

    await page.fill(byTestId('check-in-soc'), '68');
    await page.fill(byTestId('check-in-time'), '2027-09-14 18:00');
    await page.click(byTestId('check-in-cylinder-0-part'));
    await page.fill(byTestId('check-in-cylinder-0-amount'), '40');
    await page.fill(byTestId('check-in-note'), 'Fan ran all night');
    await page.click(byTestId('check-in-save'));
    await page.waitForSelector(byTestId('check-in-saved'));
    await page.waitForSelector(byTestId('reforecast-headline'));
    expect((await page.textContent(byTestId('reforecast-headline')))?.trim()).toMatch(HEADLINE);
    const list = (await page.textContent(byTestId('check-in-list'))) ?? '';
    expect(list).toContain('Tue 14 Sep, 18:00 · 68 %');
    expect(list).toContain(DEMO_ACCOUNT.name);
    expect(list).toContain('Fan ran all night');
    await expectTidy(page, 'check-in-phone');

    await page.click(byTestId('tab-budget'));
    await page.waitForSelector(byTestId('budget-screen'));
    await page.waitForSelector(byTestId('reforecast-headline'));
    expect((await page.textContent(byTestId('reforecast-headline')))?.trim()).toMatch(HEADLINE);

    // Stay a night longer where the reading was taken: the what-if shows at once, and Keep saves it.
    const leavingBefore = await lastDeparture(page, tripId);
    await page.click(byTestId('tab-check-in'));
    await page.locator(byTestId('stay-more')).scrollIntoViewIfNeeded();
    await page.click(byTestId('stay-more'));
    expect(await page.textContent(byTestId('stay-nights'))).toContain('+1');
    expect(await page.textContent(byTestId('stay-what-if'))).toMatch(/What-if: lowest ahead \d+ % on .+ \(now \d+ %\)/);
    await page.click(byTestId('stay-keep'));
    await expect.poll(() => page.textContent(byTestId('toast')), { timeout: 10_000 }).toContain('Saved: +1 night');
    // The rest of the trip moved by the night: the last stop is left a day later.
    await expect.poll(() => lastDeparture(page, tripId), { timeout: 10_000 }).toBe(leavingBefore + 86_400_000);

    // Two more readings at the pinewood, fuller than the plan says: the offer to calibrate appears.
    expect(await page.locator(byTestId('calibrate-open')).count()).toBe(0);
    await checkIn(page, '2027-09-15 07:00', 37);
    await checkIn(page, '2027-09-15 18:00', 16);
    await useWhatWeSaw(page);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when the trip is opened at laptop width, then the check-in tab and the before/after of a calibration lay out in two panes without overflow', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop, timezoneId: 'Europe/London' });
    const page = await context.newPage();
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await openCheckIn(page);
    await page.waitForSelector(byTestId('check-in-form'));
    // The phone journey above left readings that disagree with the plan: its before/after beside the list.
    await page.click(byTestId('calibrate-open'));
    await page.waitForSelector(byTestId('calibrate-result'), { timeout: 20_000 });
    await expectTidy(page, 'check-in-desktop');
    await context.close();
  });

  it('when a viewer opens the check-in tab, then the readings are listed and there is no form', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone, timezoneId: 'Europe/London' });
    const page = await context.newPage();
    await signIn(page, suite.server.url, DEMO_VIEWER.email, DEMO_VIEWER.password);
    await openCheckIn(page);
    await page.waitForSelector(byTestId('check-in-list'));
    expect(await page.locator(byTestId('check-in-form')).count()).toBe(0);
    await context.close();
  });
});
