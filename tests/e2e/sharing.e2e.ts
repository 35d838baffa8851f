// Sharing in the browser: an organiser invites by e-mail from the People tab, the invitee reads the
// message in the development Outbox, follows its link, creates an account, joins and edits a routine.
// Clubs, the club page, the Outbox and the invite page are screenshotted at both widths and axe-scanned.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT, DEMO_CREW } from '@/db/seed';
import {
  byTestId,
  openTrip,
  screenshot,
  seriousA11yViolations,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const suite = useServerAndBrowser();

const TRIP = 'Highland loop';

/** A page in its own browser context: its own cookies, and what axe needs to scan it. */
async function freshPage(viewport: { width: number; height: number }): Promise<Page> {
  const context = await suite.browser.newContext({ viewport });
  return context.newPage();
}

async function expectAccessible(page: Page, screen: string): Promise<void> {
  // Let toasts and late layout settle so the scan sees the screen as a person would.
  await page.waitForTimeout(300);
  expect({ screen, violations: await seriousA11yViolations(page) }).toEqual({ screen, violations: [] });
}

async function openPeople(page: Page): Promise<void> {
  await openTrip(page, TRIP);
  await page.click(byTestId('tab-people'));
  await page.waitForSelector(byTestId('members'));
  await page.waitForSelector('[data-testid^="member-"][data-testid$="-role"]');
}

async function invite(page: Page, email: string, role: 'crew' | 'viewer' | 'planner'): Promise<void> {
  await page.fill(byTestId('invite-email'), email);
  await page.click(byTestId(`invite-role-${role}`));
  await page.click(byTestId('invite-submit'));
  await page.locator(byTestId('pending-invites')).getByText(email).waitFor();
}

/** Opens the Outbox (signed out is fine) and the newest invite sent to `email` (sign-up also mails a confirmation). */
async function openInviteMailTo(page: Page, email: string): Promise<void> {
  await page.goto(`${suite.server.url}/outbox`);
  await page.waitForSelector(byTestId('outbox-list'));
  await page
    .locator('[data-testid^="outbox-message-"]')
    .filter({ hasText: email })
    .filter({ hasText: 'invited you' })
    .first()
    .click();
  await page.waitForSelector(byTestId('outbox-reader'));
}

describe('sharing a trip by e-mail', () => {
  it('when the organiser invites a new address as crew at 360 px, then that person joins from the Outbox link and edits a routine', async () => {
    const started = Date.now();
    const organiser = await freshPage(VIEWPORTS.phone);
    const organiserErrors = trackPageErrors(organiser);
    await signIn(organiser, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await openPeople(organiser);
    await screenshot(organiser, 'sharing-people-phone');
    await expectAccessible(organiser, 'people (phone)');

    // An existing member is refused beside the address, and what was typed stays.
    await organiser.fill(byTestId('invite-email'), DEMO_CREW.email);
    await organiser.click(byTestId('invite-submit'));
    await expect.poll(() => organiser.textContent(byTestId('invite-card'))).toMatch(/already a member/i);
    expect(await organiser.inputValue(byTestId('invite-email'))).toBe(DEMO_CREW.email);

    const newcomer = `morag-${Date.now()}@example.test`;
    await invite(organiser, newcomer, 'crew');
    expect(await organiser.textContent(byTestId('pending-invites'))).toMatch(/Crew/);
    expect(organiserErrors).toEqual([]);

    // The invitee has no account and nothing open: a fresh, signed-out browser context.
    const member = await freshPage(VIEWPORTS.phone);
    const memberErrors = trackPageErrors(member);
    await openInviteMailTo(member, newcomer);
    expect(await member.textContent(byTestId('outbox-reader'))).toContain('Highland loop');
    await screenshot(member, 'sharing-outbox-phone');
    await expectAccessible(member, 'outbox (phone)');

    await member.click(byTestId('outbox-link-0'));
    await member.waitForSelector(byTestId('invite-valid'));
    expect(await member.textContent(byTestId('invite-screen'))).toMatch(/Highland loop as Crew/);
    expect(await member.inputValue(byTestId('sign-up-email'))).toBe(newcomer);
    await screenshot(member, 'sharing-invite-phone');
    await expectAccessible(member, 'invite (phone)');

    await member.fill(byTestId('sign-up-name'), 'Morag Sinclair');
    await member.fill(byTestId('sign-up-password'), 'rally-field-2027');
    await member.click(byTestId('sign-up-submit'));
    await member.waitForSelector(byTestId('trip-frame'));
    expect(new URL(member.url()).pathname).toMatch(/^\/trips\/[^/]+$/);
    await expect.poll(() => member.textContent(byTestId('trip-frame'))).toContain('Crew');

    // As crew, change when the laptop runs and save it.
    await member.click(byTestId('tab-loads'));
    await member.locator('[data-testid^="appliance-"]').filter({ hasText: 'Laptop' }).first().click();
    await member.waitForSelector(byTestId('routine-strip'));
    const cell = member.locator(byTestId('routine-strip-cell-9')).first();
    const before = await cell.getAttribute('aria-checked');
    await cell.click();
    const after = before === 'true' ? 'false' : 'true';
    expect(await cell.getAttribute('aria-checked')).toBe(after);
    await member.click(byTestId('schedule-save'));
    await member.locator(byTestId('toast')).filter({ hasText: 'Routine saved' }).waitFor();

    // After a reload the routine reads back from the server as saved.
    await member.reload();
    await member.waitForSelector(byTestId('loads-screen'));
    await member.locator('[data-testid^="appliance-"]').filter({ hasText: 'Laptop' }).first().click();
    await member.waitForSelector(byTestId('routine-strip'));
    expect(await member.locator(byTestId('routine-strip-cell-9')).first().getAttribute('aria-checked')).toBe(after);

    // The link worked once: opening it again says so instead of joining twice.
    await openInviteMailTo(member, newcomer);
    await member.click(byTestId('outbox-link-0'));
    await member.waitForSelector(byTestId('invite-used'));

    // The organiser sees the newcomer as crew, and the invite is no longer waiting.
    await organiser.reload();
    await organiser.waitForSelector(byTestId('members'));
    await expect.poll(() => organiser.textContent(byTestId('members'))).toContain('Morag Sinclair');
    await expect.poll(() => organiser.textContent(byTestId('invites-card'))).not.toContain(newcomer);
    expect(memberErrors).toEqual([]);
    console.log(`invite → join → routine saved at 360 px: ${((Date.now() - started) / 1000).toFixed(1)} s`);
    await member.context().close();
    await organiser.context().close();
  });

  it('when someone signed in with another address opens an invite at 1440 px, then they are told to sign in with the invited one, nothing is joined, and a revoked link says so', async () => {
    const organiser = await freshPage(VIEWPORTS.desktop);
    await signIn(organiser, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await openPeople(organiser);
    const invited = `ewan-${Date.now()}@example.test`;
    await invite(organiser, invited, 'viewer');
    await screenshot(organiser, 'sharing-people-desktop');
    await expectAccessible(organiser, 'people (desktop)');

    const other = await freshPage(VIEWPORTS.desktop);
    await signIn(other, suite.server.url, DEMO_CREW.email, DEMO_CREW.password);
    await openInviteMailTo(other, invited);
    await screenshot(other, 'sharing-outbox-desktop');
    await expectAccessible(other, 'outbox (desktop)');
    await other.click(byTestId('outbox-link-0'));
    await other.waitForSelector(byTestId('invite-wrong-account'));
    expect(await other.textContent(byTestId('invite-wrong-account'))).toContain(invited);
    expect(await other.locator(byTestId('invite-join')).count()).toBe(0);
    await screenshot(other, 'sharing-invite-desktop');
    await expectAccessible(other, 'invite (desktop)');

    // Signing out keeps the page and offers the invited address.
    await other.click(byTestId('invite-sign-out'));
    await other.waitForSelector(byTestId('invite-auth'));
    expect(await other.inputValue(byTestId('sign-up-email'))).toBe(invited);

    // Nothing was joined: the invite still waits, until the owner revokes it (after confirming).
    await organiser.reload();
    await organiser.waitForSelector(byTestId('pending-invites'));
    const row = organiser.locator('[data-testid^="invite-"]').filter({ hasText: invited }).first();
    const inviteTestId = (await row.getAttribute('data-testid')) ?? '';
    await organiser.click(byTestId(`${inviteTestId}-revoke`));
    await organiser.click(byTestId(`${inviteTestId}-revoke-yes`));
    await organiser.locator(byTestId('toast')).filter({ hasText: 'Invite revoked' }).waitFor();
    await expect.poll(() => organiser.textContent(byTestId('invites-card'))).not.toContain(invited);

    // The link now says it was withdrawn instead of offering to join.
    await other.reload();
    await other.waitForSelector(byTestId('invite-revoked'));
    expect(await other.textContent(byTestId('invite-refused'))).toContain('withdrawn');
    expect(await other.locator(byTestId('invite-auth')).count()).toBe(0);
    await other.context().close();
    await organiser.context().close();
  });
});

describe.each(Object.entries(VIEWPORTS))('clubs at %s width', (name, viewport) => {
  it('when the organiser creates a club and invites households with one bad address (pasted on a phone, a CSV file on a laptop), then the good ones are sent, the bad one is reported by line, and the trip’s People tab lists the club share until the owner withdraws it', async () => {
    const page = await freshPage(viewport);
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await page.click(byTestId('nav-clubs'));
    // Once the list has loaded: the empty state (with the form) or the button that opens the form.
    await page.waitForSelector(`${byTestId('clubs-empty')}, ${byTestId('clubs-new')}`);
    if (await page.locator(byTestId('clubs-empty')).count()) {
      await screenshot(page, `sharing-clubs-empty-${name}`);
      await expectAccessible(page, `clubs empty (${name})`);
    } else {
      await page.click(byTestId('clubs-new'));
    }
    await page.fill(byTestId('create-club-name'), `Glen Rally Club ${name}`);
    await page.click(byTestId('create-club-submit'));
    await page.waitForSelector(byTestId('club-invite-form'));

    if (name === 'phone') {
      await page.fill(
        byTestId('club-invite-addresses'),
        `Kirsty Bell <kirsty-${name}@example.test>\nangus-${name}@example.test, not an address`,
      );
    } else {
      // On a laptop the organiser picks the club's CSV export (name,email per row) instead of pasting.
      const csv = `name,email\nKirsty Bell,kirsty-${name}@example.test\nAngus Reid,angus-${name}@example.test\nNo Address,not an address\n`;
      const chooser = page.waitForEvent('filechooser');
      await page.click(byTestId('club-invite-csv'));
      await (await chooser).setFiles({ name: 'households.csv', mimeType: 'text/csv', buffer: Buffer.from(csv) });
      await page.waitForSelector(byTestId('club-invite-csv-chosen'));
    }
    await page.click(byTestId('club-invite-submit'));
    await page.waitForSelector(byTestId('club-invite-report'));
    expect(await page.textContent(byTestId('club-invite-sent'))).toMatch(/^2 invites sent/);
    // Pasted, the bad address is on line 2; in the CSV it is the fourth line (after the header).
    expect(await page.textContent(byTestId('club-invite-rejected-0'))).toMatch(
      name === 'phone' ? /Line 2: “not an address”/ : /Line 4: .*not an address/,
    );
    // Only the refused row stays in the box, ready to fix.
    expect(await page.inputValue(byTestId('club-invite-addresses'))).toContain('not an address');
    await expect
      .poll(() => page.textContent(byTestId('club-pending-invites')))
      .toContain(`kirsty-${name}@example.test`);

    // Share the trip from its People tab; the club page then lists it with its copy count.
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('trips-screen'));
    await openPeople(page);
    await page.locator(byTestId('share-club-pick')).getByText(`Glen Rally Club ${name}`).click();
    await page.click(byTestId('share-club-submit'));
    await page
      .locator(byTestId('toast'))
      .filter({ hasText: `Shared to Glen Rally Club ${name}` })
      .waitFor();
    // The People tab lists the club among those the trip is shared with, and no longer offers it.
    const shareRow = page
      .locator('[data-testid^="trip-share-"]')
      .filter({ hasText: `Glen Rally Club ${name}` })
      .first();
    await shareRow.waitFor();
    expect(await shareRow.textContent()).toMatch(/1 household can read it · shared by .+ on /);
    expect(await page.locator(byTestId('share-club-pick')).getByText(`Glen Rally Club ${name}`).count()).toBe(0);
    await screenshot(page, `sharing-people-shares-${name}`);
    await expectAccessible(page, `people with shares (${name})`);

    await page.click(byTestId('nav-clubs'));
    await page
      .locator('[data-testid^="club-card-"]')
      .filter({ hasText: `Glen Rally Club ${name}` })
      .click();
    await page.waitForSelector(byTestId('club-trips'));
    const clubPath = new URL(page.url()).pathname;
    expect(await page.textContent(byTestId('club-trips'))).toContain('No household has copied it yet');
    await screenshot(page, `sharing-club-${name}`);
    await expectAccessible(page, `club (${name})`);

    await page.click(byTestId('back-to-clubs'));
    await page.waitForSelector(byTestId('club-list'));
    await screenshot(page, `sharing-clubs-${name}`);
    await expectAccessible(page, `clubs (${name})`);

    // The owner withdraws the share from the trip's People tab (after confirming); the club then has no trip.
    await page.goto(suite.server.url);
    await page.waitForSelector(byTestId('trips-screen'));
    await openPeople(page);
    const shareTestId = (await shareRow.getAttribute('data-testid')) ?? '';
    await page.click(byTestId(`${shareTestId}-withdraw`));
    await page.click(byTestId(`${shareTestId}-withdraw-yes`));
    await page
      .locator(byTestId('toast'))
      .filter({ hasText: `Glen Rally Club ${name} no longer sees this trip` })
      .waitFor();
    await expect.poll(() => page.locator(byTestId(shareTestId)).count()).toBe(0);
    await page.locator(byTestId('share-club-pick')).getByText(`Glen Rally Club ${name}`).waitFor();
    await page.goto(`${suite.server.url}${clubPath}`);
    await page.waitForSelector(byTestId('club-trips-empty'));
    expect(errors).toEqual([]);
    await page.context().close();
  });
});

describe('copy onto my rig', () => {
  it('when a club member copies a shared trip onto their saved rig at 360 px, then it opens with its budget and hears when the club plan moves its stops', async () => {
    const page = await freshPage(VIEWPORTS.phone);
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await page.click(byTestId('nav-clubs'));
    await page.waitForSelector(`${byTestId('clubs-empty')}, ${byTestId('clubs-new')}`);
    if (await page.locator(byTestId('clubs-new')).count()) await page.click(byTestId('clubs-new'));
    await page.fill(byTestId('create-club-name'), 'Firth Caravan Club');
    await page.click(byTestId('create-club-submit'));
    await page.waitForSelector(byTestId('club-invite-form'));
    const clubPath = new URL(page.url()).pathname;

    await page.goto(suite.server.url);
    const tripId = await openTrip(page, TRIP);
    await page.click(byTestId('tab-people'));
    await page.locator(byTestId('share-club-pick')).getByText('Firth Caravan Club').click();
    await page.click(byTestId('share-club-submit'));
    await page.locator(byTestId('toast')).filter({ hasText: 'Shared to Firth Caravan Club' }).waitFor();

    // Without a saved rig the copy form offers to make one instead of failing.
    await page.goto(`${suite.server.url}${clubPath}`);
    await page.click(byTestId(`club-trip-${tripId}-copy`));
    await page.waitForSelector(byTestId(`copy-${tripId}-no-rigs`));
    expect(await page.textContent(byTestId(`copy-${tripId}-no-rigs`))).toContain('First, your own rig');

    await page.goto(`${suite.server.url}/trips/${tripId}/rig`);
    await page.fill(byTestId('rig-save-name'), 'Our caravan');
    await page.click(byTestId('rig-save-to-mine'));
    await page.locator(byTestId('toast')).filter({ hasText: 'Saved “Our caravan”' }).waitFor();

    await page.goto(`${suite.server.url}${clubPath}`);
    await page.click(byTestId(`club-trip-${tripId}-copy`));
    await page
      .locator(byTestId(`copy-${tripId}-rig`))
      .getByText('Our caravan')
      .click();
    await page.click(byTestId(`copy-${tripId}-submit`));
    await page.waitForSelector(byTestId('based-on-banner'));
    const copyId = /\/trips\/([^/]+)/.exec(new URL(page.url()).pathname)?.[1];
    expect(copyId).toBeTruthy();
    expect(copyId).not.toBe(tripId);
    expect(await page.textContent(byTestId('trip-frame'))).toContain('Highland loop (Our caravan)');
    expect(await page.textContent(byTestId('based-on-banner'))).toContain("Based on the club's plan Highland loop");
    await page.waitForSelector(byTestId('budget-screen'));
    expect(await page.locator(byTestId('based-on-changed')).count()).toBe(0);

    // The organiser renames the first stop of the club's plan (setup through the API; the Route tab is tested elsewhere).
    const status = await page.evaluate(async (id) => {
      const detail = (await (await fetch(`/api/trips/${id}`)).json()) as {
        stops: { id: string; version: number; notes: string; stop: { name: string } }[];
      };
      const first = detail.stops[0];
      if (!first) return 0;
      const body = {
        version: first.version,
        notes: first.notes,
        stop: { ...first.stop, name: `${first.stop.name} (new pitch)` },
      };
      return (
        await fetch(`/api/trips/${id}/stops/${first.id}`, {
          method: 'PATCH',
          headers: { 'Content-Type': 'application/json' },
          body: JSON.stringify(body),
        })
      ).status;
    }, tripId);
    expect(status).toBe(200);

    await page.reload();
    await page.waitForSelector(byTestId('based-on-changed'));
    // Scan once the lazily loaded chart is in place, not while the page is still assembling.
    await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
    await screenshot(page, 'sharing-copy-budget-phone');
    await expectAccessible(page, 'copy budget (phone)');
    await page.click(byTestId('tab-route'));
    await page.click(byTestId('based-on-seen'));
    await page.waitForSelector(byTestId('based-on-changed'), { state: 'detached' });
    await page.reload();
    await page.waitForSelector(byTestId('based-on-banner'));
    expect(await page.locator(byTestId('based-on-changed')).count()).toBe(0);

    await page.goto(`${suite.server.url}${clubPath}`);
    await expect.poll(() => page.textContent(byTestId(`club-trip-${tripId}-copies`))).toBe('1 household has copied it');
    await page.click(byTestId(`club-trip-${tripId}-my-copy`));
    await page.waitForURL(`**/trips/${copyId ?? ''}`);
    expect(errors).toEqual([]);
    await page.context().close();
  });
});

describe('account e-mails', () => {
  it('when someone forgets their password, then the Outbox link lets them choose a new one and sign in with it', async () => {
    const page = await freshPage(VIEWPORTS.phone);
    const errors = trackPageErrors(page);
    const email = `fenella-${Date.now()}@example.test`;
    await page.goto(suite.server.url);
    await page.click(byTestId('go-to-sign-up'));
    await page.fill(byTestId('sign-up-name'), 'Fenella Ross');
    await page.fill(byTestId('sign-up-email'), email);
    await page.fill(byTestId('sign-up-password'), 'first-password-1');
    await page.click(byTestId('sign-up-submit'));
    await page.waitForSelector(byTestId('trips-screen'));
    await page.context().clearCookies();

    await page.goto(`${suite.server.url}/forgot-password`);
    await page.fill(byTestId('forgot-email'), email);
    await page.click(byTestId('forgot-submit'));
    await page.waitForSelector(byTestId('forgot-sent'));

    await page.goto(`${suite.server.url}/outbox`);
    await page
      .locator('[data-testid^="outbox-message-"]')
      .filter({ hasText: email })
      .filter({ hasText: 'password' })
      .first()
      .click();
    await page.click(byTestId('outbox-link-0'));
    await page.waitForSelector(byTestId('reset-password'));
    await page.fill(byTestId('reset-password'), 'second-password-2');
    await page.fill(byTestId('reset-repeat'), 'second-password-3');
    await page.click(byTestId('reset-submit'));
    await page.waitForSelector('text=The two passwords differ.');
    await page.fill(byTestId('reset-repeat'), 'second-password-2');
    await page.click(byTestId('reset-submit'));
    await page.waitForSelector(byTestId('reset-done'));

    await page.click(byTestId('reset-to-sign-in'));
    await page.fill(byTestId('sign-in-email'), email);
    await page.fill(byTestId('sign-in-password'), 'first-password-1');
    await page.click(byTestId('sign-in-submit'));
    await expect.poll(() => page.textContent(byTestId('sign-in-error'))).toMatch(/do not match/);
    await page.fill(byTestId('sign-in-password'), 'second-password-2');
    await page.click(byTestId('sign-in-submit'));
    await page.waitForSelector(byTestId('trips-screen'));
    expect(errors).toEqual([]);
    await page.context().close();
  });
});
