import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, screenshot, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

describe('password rule on the forms', () => {
  it('when a newcomer picks a common password or their address, then the form says why before anything is sent', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    const errors = trackPageErrors(page);
    const scripts: string[] = [];
    const signUps: string[] = [];
    page.on('request', (req) => {
      if (req.resourceType() === 'script') scripts.push(req.url());
      if (req.url().includes('/api/auth/sign-up')) signUps.push(req.url());
    });

    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('sign-in-screen'));
    // The word lists stay out of the entry bundle: signing in never loads them.
    expect(scripts.filter((url) => url.includes('password-strength'))).toEqual([]);

    await page.click(byTestId('go-to-sign-up'));
    await page.waitForSelector(byTestId('sign-up-screen'));
    const email = `newcomer-${Date.now()}@example.test`;
    await page.fill(byTestId('sign-up-name'), 'Morven Newcomer');
    await page.fill(byTestId('sign-up-email'), email);

    await page.fill(byTestId('sign-up-password'), '12345678');
    await page.click(byTestId('sign-up-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-up-screen'))).toContain('one of the most used passwords');

    await page.fill(byTestId('sign-up-password'), email);
    await page.click(byTestId('sign-up-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-up-screen'))).toContain('cannot be your e-mail address');
    expect(signUps).toEqual([]);
    expect(scripts.filter((url) => url.includes('password-strength'))).toHaveLength(1);

    await page.fill(byTestId('sign-up-password'), 'heather-on-the-ridge');
    await page.click(byTestId('sign-up-submit'));
    await page.waitForSelector(byTestId('trips-empty'));
    expect(errors).toEqual([]);
  });
});

describe('the sign-in page before the app has loaded', () => {
  it('when the app script is slow to arrive, then the form already shows, its button waits, and what was typed is kept', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    const errors = trackPageErrors(page);
    // React reports a page it could not adopt as it was drawn (a hydration mismatch) on the console.
    const consoleErrors: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') consoleErrors.push(message.text());
    });
    let release = () => {};
    const scriptHeld = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/_expo/static/js/web/entry-*.js', async (route) => {
      await scriptHeld;
      await route.continue();
    });

    await page.goto(suite.server.url, { waitUntil: 'commit' });
    await page.waitForSelector(byTestId('sign-in-email'), { state: 'visible' });
    await expect.poll(() => page.getAttribute(byTestId('sign-in-submit'), 'aria-disabled')).toBe('true');
    await page.fill(byTestId('sign-in-email'), DEMO_ACCOUNT.email);
    await page.fill(byTestId('sign-in-password'), DEMO_ACCOUNT.password);
    await screenshot(page, 'sign-in-before-app-loaded-phone');

    release();
    await page.waitForSelector(`${byTestId('sign-in-submit')}:not([aria-disabled="true"])`);
    expect(await page.inputValue(byTestId('sign-in-email'))).toBe(DEMO_ACCOUNT.email);
    await page.click(byTestId('sign-in-submit'));
    await page.waitForSelector(byTestId('trips-screen'));
    expect(errors).toEqual([]);
    expect(consoleErrors.filter((text) => /hydrat|#418|#419|#423|#425/i.test(text))).toEqual([]);
  });
});
