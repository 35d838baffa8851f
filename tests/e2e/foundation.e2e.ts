import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, screenshot, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

describe.each(Object.entries(VIEWPORTS))('at %s width', (name, viewport) => {
  it('when a new traveller signs up, then they see the empty state, can sign out and sign in as the demo user', async () => {
    const page = await suite.browser.newPage({ viewport });
    const errors = trackPageErrors(page);
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('sign-in-screen'));
    await screenshot(page, `sign-in-${name}`);

    // A wrong password gets a clear message and keeps the e-mail typed in.
    await page.fill(byTestId('sign-in-email'), DEMO_ACCOUNT.email);
    await page.fill(byTestId('sign-in-password'), 'not-the-password');
    await page.click(byTestId('sign-in-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-in-error'))).toMatch(/do not match an account/);
    expect(await page.inputValue(byTestId('sign-in-email'))).toBe(DEMO_ACCOUNT.email);

    await page.click(byTestId('go-to-sign-up'));
    await page.waitForSelector(byTestId('sign-up-screen'));
    // A taken e-mail is refused with a message that says what to do.
    await page.fill(byTestId('sign-up-name'), 'Someone Else');
    await page.fill(byTestId('sign-up-email'), DEMO_ACCOUNT.email);
    await page.fill(byTestId('sign-up-password'), 'long-enough-pass');
    await page.click(byTestId('sign-up-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-up-error'))).toMatch(/already exists/);
    await screenshot(page, `sign-up-error-${name}`);

    const email = `new-${name}-${Date.now()}@example.test`;
    await page.fill(byTestId('sign-up-name'), 'Morven Test');
    await page.fill(byTestId('sign-up-email'), email);
    await page.click(byTestId('sign-up-submit'));
    await page.waitForSelector(byTestId('trips-empty'));
    await screenshot(page, `trips-empty-${name}`);

    await page.click(byTestId('nav-account'));
    await page.waitForSelector(byTestId('account-screen'));
    expect(await page.textContent(byTestId('account-screen'))).toContain(email);
    await page.click(byTestId('sign-out'));
    await page.waitForSelector(byTestId('sign-in-screen'));

    await page.fill(byTestId('sign-in-email'), DEMO_ACCOUNT.email);
    await page.fill(byTestId('sign-in-password'), DEMO_ACCOUNT.password);
    await page.click(byTestId('sign-in-submit'));
    await page.waitForSelector(byTestId('trip-list'));
    const cards = await page.locator('[data-testid^="trip-open-"]').allTextContents();
    expect(cards.join(' ')).toContain('Highland loop');
    expect(cards.join(' ')).toContain('Desert spring loop');
    await page.waitForTimeout(300);
    await screenshot(page, `trips-${name}`);

    // The page's text is set in the shipped Nunito, loaded from the app's own assets.
    const loadedFaces = await page.evaluate(() =>
      [...document.fonts].filter((face) => face.status === 'loaded').map((face) => face.family.replace(/"/g, '')),
    );
    expect(loadedFaces).toEqual(expect.arrayContaining(['Nunito_400Regular', 'Nunito_800ExtraBold']));
    const titleFont = await page
      .locator('[role="heading"]')
      .first()
      .evaluate((el) => getComputedStyle(el).fontFamily);
    expect(titleFont).toContain('Nunito');

    await page.locator('[data-testid^="trip-open-"]').filter({ hasText: 'Highland loop' }).click();
    await page.waitForSelector(byTestId('trip-frame'));
    await expect.poll(() => page.textContent(byTestId('trip-frame'))).toContain('12–19 Sep 2027');
    await screenshot(page, `trip-${name}`);
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe('when the server is unreachable', () => {
  it('then signing in says the server cannot be reached', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('sign-in-screen'));
    await page.route('**/api/**', (route) => route.abort('connectionrefused'));
    await page.fill(byTestId('sign-in-email'), DEMO_ACCOUNT.email);
    await page.fill(byTestId('sign-in-password'), DEMO_ACCOUNT.password);
    await page.click(byTestId('sign-in-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-in-error'))).toMatch(/Can't reach the Trailtally server/);
    await screenshot(page, 'sign-in-server-down-phone');
    await page.close();
  });
});
