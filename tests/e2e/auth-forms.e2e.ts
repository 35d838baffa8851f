import { describe, expect, it } from 'vitest';
import { byTestId, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

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
