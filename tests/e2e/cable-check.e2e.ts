// The cable check on the Rig tab, at phone width in metric units and at laptop width in US units: every run with
// its verdict, nothing cut off or scrolling sideways, a failing run fixed and saved with the rig.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT, DEMO_VIEWER } from '@/db/seed';
import {
  byTestId,
  openTrip,
  screenshotTall,
  shootAt,
  seriousA11yViolations,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const suite = useServerAndBrowser();

async function openCableCheck(page: Page, trip: string): Promise<void> {
  await openTrip(page, trip);
  await page.click(byTestId('tab-rig'));
  await page.waitForSelector(byTestId('rig-cable-check'));
  await page.locator(byTestId('rig-cable-check')).scrollIntoViewIfNeeded();
}

/** No sideways scrolling, and nothing inside the cable check reaching past its card's edges. */
async function expectNothingCutOff(page: Page): Promise<void> {
  const widths = await page.evaluate(() => ({
    scroll: document.documentElement.scrollWidth,
    inner: window.innerWidth,
  }));
  expect(widths.scroll).toBeLessThanOrEqual(widths.inner);
  const outside = await page.evaluate((selector) => {
    const section = document.querySelector(selector);
    if (!section) return ['no cable check on screen'];
    const edge = section.getBoundingClientRect();
    return [...section.querySelectorAll('*')]
      .filter((el) => {
        const box = el.getBoundingClientRect();
        return box.width > 0 && (box.left < edge.left - 0.5 || box.right > edge.right + 0.5);
      })
      .map((el) => `${el.getAttribute('data-testid') ?? el.tagName}: ${el.textContent?.slice(0, 40) ?? ''}`);
  }, byTestId('rig-cable-check'));
  expect(outside).toEqual([]);
}

describe('the cable check on the Rig tab', () => {
  it('when a planner opens it on a phone in metric units, then runs read in mm² and metres, and fixing the failing run saves with the rig', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await openCableCheck(page, 'Highland loop');

    // The roof array run carries its current but loses too much voltage, and says so.
    const arrayRun = byTestId('dc-run-2');
    expect(await page.textContent(byTestId('dc-run-2-headline'))).toBe('Fails: loses too much voltage');
    expect(await page.textContent(`${arrayRun} ${byTestId('dc-run-2-verdict')}`)).toContain('It carries the current');
    expect(await page.textContent(arrayRun)).toContain('6 m');
    expect(await page.textContent(arrayRun)).toContain('6 mm² (≈ 10 AWG)');
    expect(await page.textContent(byTestId('dc-run-0-headline'))).toBe('Passes');
    expect(await page.textContent(byTestId('cable-failing-value'))).toBe('1');
    await page.waitForSelector(byTestId('caution-cabling'));
    await page.waitForSelector(byTestId('cable-defer'));
    await expectNothingCutOff(page);
    await screenshotTall(page, 'cable-check-phone');
    await shootAt(page, 'rig-cable-check', 'cable-check-top-phone');
    await shootAt(page, 'dc-run-2', 'cable-check-failing-run-phone');

    // Two sizes up, the run passes; the editor fits the phone too.
    await page.click(byTestId('dc-run-2-edit'));
    await page.waitForSelector(byTestId('dc-run-2-editor'));
    await page.click(byTestId('dc-run-2-size-thicker'));
    await page.click(byTestId('dc-run-2-size-thicker'));
    await expect.poll(() => page.textContent(byTestId('dc-run-2-size-value'))).toContain('16');
    await expect.poll(() => page.textContent(byTestId('dc-run-2-headline'))).toBe('Passes');
    expect(await page.textContent(byTestId('cable-failing-value'))).toBe('0');
    await expectNothingCutOff(page);
    await shootAt(page, 'dc-run-2', 'cable-check-editor-phone');
    await shootAt(page, 'dc-run-2-critical', 'cable-check-editor-end-phone');
    expect(await seriousA11yViolations(page)).toEqual([]);

    await page.click(byTestId('rig-save'));
    await expect.poll(() => page.textContent(byTestId('toast'))).toContain('Rig saved');
    await page.reload();
    await page.waitForSelector(byTestId('rig-cable-check'));
    // The device's copy shows first; the server's answer replaces it a moment later.
    await expect.poll(() => page.textContent(byTestId('dc-run-2'))).toContain('16 mm² (≈ 6 AWG)');
    await expect.poll(() => page.textContent(byTestId('dc-run-2-headline'))).toBe('Passes');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when a planner reads it on a laptop in US units, then runs read in AWG and feet, and the NFPA 70 basis fails the big inverter cable', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await page.goto(`${suite.server.url}/account`);
    await page.click(byTestId('units-us'));
    await expect.poll(() => page.textContent(byTestId('toast'))).toContain('US units');
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('trips-screen'));
    await openCableCheck(page, 'Desert spring loop');

    expect(await page.textContent(byTestId('dc-run-0'))).toContain('4/0 AWG (107.2 mm²)');
    expect(await page.textContent(byTestId('dc-run-0'))).toContain('4.9 ft');
    expect(await page.textContent(byTestId('dc-run-3-headline'))).toBe('Fails: loses too much voltage');
    await expectNothingCutOff(page);
    await screenshotTall(page, 'cable-check-desktop');
    await shootAt(page, 'rig-cable-check', 'cable-check-top-desktop');

    // The editor fits the wide screen too, and a new load circuit comes in sized by the check.
    await page.click(byTestId('dc-run-3-edit'));
    await page.waitForSelector(byTestId('dc-run-3-editor'));
    await expectNothingCutOff(page);
    await shootAt(page, 'dc-run-3', 'cable-check-editor-desktop');
    await page.click(byTestId('cable-add-dc-load'));
    await expect.poll(() => page.textContent(byTestId('dc-run-6-headline'))).toBe('Passes');

    await page.click(byTestId('cable-basis-nfpa70'));
    await expect.poll(() => page.textContent(byTestId('dc-run-0-headline'))).toContain('too thin for the current');
    expect(await page.textContent(byTestId('dc-run-0-verdict'))).toContain('No single conductor up to 4/0 AWG passes');
    await expectNothingCutOff(page);
    await shootAt(page, 'dc-run-0', 'cable-check-nfpa-desktop');
    expect(await seriousA11yViolations(page)).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when a new trip’s rig has no runs, then runs are suggested from its parts and can be taken up and saved', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await page.click(byTestId('new-trip'));
    await page.waitForSelector(byTestId('new-trip-rig-preset:van-small'));
    await page.fill(byTestId('new-trip-name'), 'Cable weekend');
    await page.fill(byTestId('new-trip-startDate'), '2027-10-04');
    await page.fill(byTestId('new-trip-endDate'), '2027-10-06');
    await page.click(byTestId('new-trip-timeZone-change'));
    await page.fill(byTestId('new-trip-timeZone-list-search'), 'London');
    await page.click(byTestId('new-trip-timeZone-list-option-Europe/London'));
    await page.click(byTestId('new-trip-rig-preset:van-small'));
    await page.click(byTestId('new-trip-submit'));
    await page.waitForSelector(byTestId('route-screen'));
    await page.click(byTestId('tab-rig'));
    await page.waitForSelector(byTestId('cable-suggested'));
    expect(await page.textContent(byTestId('dc-suggested-0'))).toContain('Battery to inverter');
    expect(await page.locator(byTestId('dc-run-0')).count()).toBe(0);
    await expectNothingCutOff(page);
    await shootAt(page, 'cable-suggested', 'cable-check-suggested-phone');

    await page.click(byTestId('cable-use-suggested'));
    await page.waitForSelector(byTestId('dc-run-0-headline'));
    await page.click(byTestId('rig-save'));
    // The trip's "created" message may still be showing above this one.
    await page.locator(byTestId('toast')).filter({ hasText: 'Rig saved' }).waitFor();
    await page.reload();
    await page.waitForSelector(byTestId('dc-run-0-headline'));
    expect(await page.locator(byTestId('cable-suggested')).count()).toBe(0);
    // The account reads US units since the laptop test above: AWG, with the metric area beside it.
    expect(await page.textContent(byTestId('dc-run-0'))).toMatch(/AWG \([\d.]+ mm²\)/);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when a viewer opens it, then the verdicts are there and nothing can be edited', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    await signIn(page, suite.server.url, DEMO_VIEWER.email, DEMO_VIEWER.password);
    await openCableCheck(page, 'Highland loop');
    await page.waitForSelector(byTestId('dc-run-2-headline'));
    expect(await page.locator(byTestId('dc-run-2-edit')).count()).toBe(0);
    expect(await page.locator('[data-testid^="cable-add-"]').count()).toBe(0);
    await context.close();
  });
});
