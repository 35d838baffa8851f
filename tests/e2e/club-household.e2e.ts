// A new household's first visit: from a club invite link to its own copy of the club's plan, on its own rig with its
// own loads, at phone width, without a dead end on the way.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { byTestId, screenshot, signIn, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';

const suite = useServerAndBrowser();

const SHARED_LOAD = 'Rally field lights (shared)';

/** The organiser's side, set up through the API: a shared load on the plan, a club, the share and the invite. */
async function organiserSharesPlan(page: Page, household: string): Promise<{ tripId: string }> {
  await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
  const headers = { Origin: suite.server.url };
  const api = (path: string) => `${suite.server.url}/api${path}`;
  const trips = (await (await page.request.get(api('/trips'))).json()) as { trips: { id: string; name: string }[] };
  const tripId = trips.trips.find((t) => t.name === 'Highland loop')?.id ?? '';
  const appliance = {
    name: SHARED_LOAD,
    circuit: 'dc',
    runningW: 20,
    schedule: { kind: 'routine', windows: [{ startHour: 19, minutes: 180 }] },
  };
  expect((await page.request.post(api(`/trips/${tripId}/appliances`), { data: { appliance }, headers })).status()).toBe(
    201,
  );
  const club = await page.request.post(api('/clubs'), { data: { name: 'Strath rally club' }, headers });
  const clubId = ((await club.json()) as { club: { id: string } }).club.id;
  await page.request.post(api(`/clubs/${clubId}/trips`), { data: { tripId }, headers });
  await page.request.post(api(`/clubs/${clubId}/invites`), { data: { addresses: household }, headers });
  return { tripId };
}

describe('a new club household', () => {
  it('when a household follows the invite link at 360 px, then it makes its rig, adds its own load and copies the plan with one shared load, without a dead end', async () => {
    const organiser = await (await suite.browser.newContext({ viewport: VIEWPORTS.desktop })).newPage();
    const email = `household-${Date.now()}@example.test`;
    const { tripId } = await organiserSharesPlan(organiser, email);

    const page = await (await suite.browser.newContext({ viewport: VIEWPORTS.phone })).newPage();
    const errors = trackPageErrors(page);
    await page.goto(`${suite.server.url}/outbox`);
    await page.locator('[data-testid^="outbox-message-"]').filter({ hasText: email }).first().click();
    await page.click(byTestId('outbox-link-0'));
    await page.waitForSelector(byTestId('invite-valid'));
    await page.fill(byTestId('sign-up-name'), 'Isla Grant');
    await page.fill(byTestId('sign-up-password'), 'strath-rally-2027');
    await page.click(byTestId('sign-up-submit'));
    await page.waitForSelector(byTestId('club-trips-card'));
    const clubPath = new URL(page.url()).pathname;

    // No saved rig yet: the copy step makes one here instead of sending the household away.
    await page.click(byTestId(`club-trip-${tripId}-copy`));
    await page.waitForSelector(byTestId(`copy-${tripId}-no-rigs`));
    await page.click(byTestId(`copy-${tripId}-new-rig-start-van-small`));
    await page.fill(byTestId(`copy-${tripId}-new-rig-name`), 'Isla’s van');
    await screenshot(page, 'household-copy-new-rig-phone');
    await page.click(byTestId(`copy-${tripId}-new-rig-submit`));
    await page.waitForSelector(byTestId(`copy-${tripId}-form`));

    // Its own usual load, added in My rigs.
    await page.click(byTestId('nav-rigs'));
    await page.waitForSelector(byTestId('rigs-list'));
    await page.locator('[data-testid^="rig-card-"]').filter({ hasText: 'Isla’s van' }).click();
    await page.waitForSelector(byTestId('rig-loads'));
    await page.click(byTestId('library-by-hand'));
    await page.fill(byTestId('rig-load-name'), 'Our fridge');
    await page.fill(byTestId('rig-load-watts'), '45');
    await page.click(byTestId('rig-load-add'));
    await expect.poll(() => page.textContent(byTestId('rig-loads'))).toContain('Our fridge');
    await page.locator(byTestId('rig-loads')).evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await screenshot(page, 'household-rig-loads-phone');

    // Back to the plan: the rig's loads come along, and only the ticked shared load of the plan's.
    await page.goto(`${suite.server.url}${clubPath}`);
    await page.click(byTestId(`club-trip-${tripId}-copy`));
    await page.waitForSelector(byTestId(`copy-${tripId}-form`));
    await expect.poll(() => page.textContent(byTestId(`copy-${tripId}-rig-loads`))).toContain('Our fridge');
    await page.locator(`[data-testid^="copy-${tripId}-share-"]`).filter({ hasText: SHARED_LOAD }).click();
    await page.locator(byTestId(`copy-${tripId}-form`)).evaluate((el) => el.scrollIntoView({ block: 'start' }));
    await screenshot(page, 'household-copy-tick-phone');
    await page.click(byTestId(`copy-${tripId}-submit`));
    await page.waitForSelector(byTestId('based-on-banner'));
    await page.click(byTestId('tab-loads'));
    await page.waitForSelector(byTestId('loads-screen'));
    // The copy's appliance list (not the library of appliances to add below it).
    const names = await page
      .locator('[data-testid^="appliance-"][role="button"]')
      .evaluateAll((rows) => rows.map((row) => row.getAttribute('aria-label') ?? ''));
    expect(names.map((name) => name.split(',')[0])).toEqual(['Our fridge', SHARED_LOAD]);
    await screenshot(page, 'household-copy-loads-phone');
    expect(errors).toEqual([]);
  });
});
