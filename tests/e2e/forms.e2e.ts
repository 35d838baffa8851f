// Forms on a phone: refusals beside their fields, all at once, the first one in view and focused; the browser's own
// date and time pickers; a viewer's read-only fields.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT, DEMO_VIEWER } from '@/db/seed';
import { byTestId, openTrip, screenshot, signIn, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

/** Where a field stands: its note (error or hint), whether it holds the focus, and whether it is on screen. */
async function fieldState(page: Page, testId: string) {
  return page.evaluate((id) => {
    const input = document.querySelector<HTMLElement>(`[data-testid="${id}"]`);
    const note = document.querySelector(`[data-testid="${id}-note"]`)?.textContent ?? null;
    if (!input) return { found: false, focused: false, inView: false, note, invalid: null };
    const box = input.getBoundingClientRect();
    return {
      found: true,
      focused: document.activeElement === input || input.contains(document.activeElement),
      inView: box.top >= 0 && box.bottom <= window.innerHeight,
      note,
      invalid: input.getAttribute('aria-invalid'),
    };
  }, testId);
}

async function openLastStop(page: Page): Promise<void> {
  await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
  await openTrip(page, 'Highland loop');
  await page.click(byTestId('tab-route'));
  await page.click(byTestId('stop-3-edit'));
  await page.waitForSelector(byTestId('stop-form'));
}

describe('the stop form on a phone', () => {
  it('when the server refuses a departure after the trip ends, then the message sits beside Leave, which is in view and focused', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await openLastStop(page);
    // Only the server knows the trip's dates: the form lets this through and the API refuses it (422).
    await page.fill(byTestId('stop-depart'), '2027-09-25T10:00');
    await page.locator(byTestId('stop-save')).scrollIntoViewIfNeeded();
    expect((await fieldState(page, 'stop-depart')).inView).toBe(false);
    await page.click(byTestId('stop-save'));
    await page.waitForSelector(`${byTestId('stop-depart')}[aria-invalid="true"]`);
    const depart = await fieldState(page, 'stop-depart');
    expect(depart.note).toBe('Departure is after the trip ends (2027-09-19).');
    expect(depart.focused).toBe(true);
    expect(depart.inView).toBe(true);
    expect(await page.locator(byTestId('stop-form-error')).count()).toBe(0);
    await screenshot(page, 'forms-stop-server-refusal-phone');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when the latitude and the temperatures are both wrong, then both refusals show at once and the first is focused', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    await openLastStop(page);
    await page.fill(byTestId('stop-lat'), '123');
    await page.fill(byTestId('stop-low'), '20');
    await page.fill(byTestId('stop-high'), '5');
    await page.click(byTestId('stop-save'));
    await page.waitForSelector(`${byTestId('stop-lat')}[aria-invalid="true"]`);
    expect(await page.getAttribute(byTestId('stop-high'), 'aria-invalid')).toBe('true');
    expect(await page.textContent(byTestId('stop-form'))).toContain('The high must be at or above the low.');
    const lat = await fieldState(page, 'stop-lat');
    expect(lat.focused).toBe(true);
    expect(lat.inView).toBe(true);
    await context.close();
  });
});

describe('date and time pickers', () => {
  it.each(['phone', 'desktop'] as const)(
    'when a stop is opened at %s width, then arrival and departure are the browser’s own date-and-time inputs, said in words',
    async (width) => {
      const context = await suite.browser.newContext({ viewport: VIEWPORTS[width], locale: 'en-GB' });
      const page = await context.newPage();
      await openLastStop(page);
      expect(await page.getAttribute(byTestId('stop-arrive'), 'type')).toBe('datetime-local');
      expect(await page.inputValue(byTestId('stop-arrive'))).toBe('2027-09-17T13:00');
      expect(await page.textContent(byTestId('stop-arrive-note'))).toMatch(/Fri.*17 Sept.*2027.*13:00/);
      expect(await page.textContent(byTestId('stop-time-zone-value'))).toContain('Europe/London');
      await page.locator(byTestId('stop-arrive')).evaluate((el) => el.scrollIntoView({ block: 'start' }));
      await screenshot(page, `forms-stop-pickers-${width}`);
      await context.close();
    },
  );
});

describe('a viewer', () => {
  it.each(['phone', 'desktop'] as const)(
    'when a viewer opens an appliance at %s width, then the Loads tab says it is read-only and its fields read as text, not boxes',
    async (width) => {
      const context = await suite.browser.newContext({ viewport: VIEWPORTS[width] });
      const page = await context.newPage();
      await signIn(page, suite.server.url, DEMO_VIEWER.email, DEMO_VIEWER.password);
      await openTrip(page, 'Highland loop');
      await page.click(byTestId('tab-loads'));
      await page.waitForSelector(byTestId('loads-read-only'));
      await page.locator('[data-testid^="appliance-"][role="button"]').first().click();
      await page.waitForSelector(byTestId('appliance-form'));
      const name = page.locator(byTestId('appliance-name'));
      expect(await name.getAttribute('aria-readonly')).toBe('true');
      const look = await name.evaluate((el) => {
        const style = getComputedStyle(el);
        return { border: style.borderTopWidth, background: style.backgroundColor };
      });
      expect(look).toEqual({ border: '0px', background: 'rgba(0, 0, 0, 0)' });
      await page.locator(byTestId('appliance-form')).evaluate((el) => el.scrollIntoView({ block: 'start' }));
      await screenshot(page, `forms-viewer-appliance-${width}`);
      await context.close();
    },
  );
});
