// Cross-site requests and the development Outbox, in a real browser against a real server. A page on another port
// of the same host is "same-site", so the browser sends the session cookie with its requests: only the API's origin
// check stands between it and the user's trips.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { BrowserContext } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, screenshot, signIn, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

/** A page on another loopback port that posts to the app twice: a credentialed fetch and a bodiless form. */
function attackPage(duplicateUrl: string): string {
  return `<!doctype html><html><head><title>Free camping tips</title></head><body>
<form id="form" method="POST" action="${duplicateUrl}"></form>
<script>
  window.fetchOutcome = fetch(${JSON.stringify(duplicateUrl)}, { method: 'POST', credentials: 'include' })
    .then((r) => 'answered ' + r.status, (e) => 'blocked: ' + e.message);
</script></body></html>`;
}

let attacker: http.Server;
let attackerUrl = '';
let duplicateUrl = '';

async function tripCount(context: BrowserContext): Promise<number> {
  const response = await context.request.get(`${suite.server.url}/api/trips`);
  expect(response.status()).toBe(200);
  return ((await response.json()) as { trips: unknown[] }).trips.length;
}

beforeAll(async () => {
  attacker = http.createServer((_req, res) => {
    res.writeHead(200, { 'Content-Type': 'text/html' });
    res.end(attackPage(duplicateUrl));
  });
  await new Promise<void>((resolve) => attacker.listen(0, '127.0.0.1', resolve));
  attackerUrl = `http://127.0.0.1:${(attacker.address() as AddressInfo).port}/`;
});
afterAll(() => new Promise<void>((resolve) => attacker.close(() => resolve())));

describe('cross-site requests', () => {
  it('when a page on another port posts to duplicate a trip with the user’s cookie, then both posts are refused and no trip is copied', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop });
    const page = await context.newPage();
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const trips = (await (await context.request.get(`${suite.server.url}/api/trips`)).json()) as {
      trips: { id: string }[];
    };
    const tripId = trips.trips[0]?.id;
    if (!tripId) throw new Error('the demo account has trips');
    duplicateUrl = `${suite.server.url}/api/trips/${tripId}/duplicate`;
    const before = await tripCount(context);

    const attack = await context.newPage();
    const fetchSent = attack.waitForEvent('request', (r) => r.url() === duplicateUrl && r.method() === 'POST');
    await attack.goto(attackerUrl);
    await fetchSent;
    // The page cannot read the answer (the API sends it no CORS headers) but the request reached the server: what
    // matters is that no copy was made.
    expect(await attack.evaluate(() => (window as unknown as { fetchOutcome: Promise<string> }).fetchOutcome)).toMatch(
      /^blocked/,
    );
    expect(await tripCount(context)).toBe(before);

    const [formResponse] = await Promise.all([
      attack.waitForNavigation(),
      attack.evaluate(() => (document.getElementById('form') as HTMLFormElement).submit()),
    ]);
    // The browser sent the session cookie along: the refusal is the origin check's, not a missing sign-in.
    expect((await formResponse?.request().allHeaders())?.cookie).toMatch(/session_token=/);
    expect(formResponse?.status()).toBe(403);
    expect(await attack.textContent('body')).toContain('forbidden_origin');

    expect(await tripCount(context)).toBe(before);
    await context.close();
  });
});

describe('the development Outbox', () => {
  it('when someone signs in on this machine, then the Outbox is linked from sign-in and Account, not the main navigation', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('sign-in-outbox'));
    await screenshot(page, 'sign-in-outbox-link-phone');

    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    expect(await page.locator('[data-testid^="nav-"]').count()).toBe(4);
    expect(await page.locator(byTestId('nav-outbox')).count()).toBe(0);
    await page.click(byTestId('nav-account'));
    await page.click(byTestId('account-outbox'));
    await page.waitForSelector(byTestId('outbox-screen'));
    expect(errors).toEqual([]);
    await context.close();
  });
});
