// The planner's whole job in the browser: a trip leader builds a trip on a laptop and fixes a flag, a crew
// member changes a routine on a phone, a viewer can only read.
import { eq } from 'drizzle-orm';
import type { Page } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { openDatabase } from '@/db/client';
import { addMember } from '@/db/queries/members';
import { user } from '@/db/schema/auth';
import { DEMO_CREW, DEMO_VIEWER } from '@/db/seed';
import {
  byTestId,
  openTrip,
  screenshot,
  shootAt,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const TRIP = 'Glen and shore test';
const LEADER = { name: 'Ailsa Leader', email: `leader-${Date.now()}@example.test`, password: 'leader-password-1' };
let tripId = '';

// A steady sky: these journeys are about editing and fixes, and a weather record arriving midway would change the
// budget under them (the record's own journey is weather.e2e.ts).
const suite = useServerAndBrowser(() => ({ WEATHER_API_URL: 'off', WEATHER_FORECAST_URL: 'off' }));

async function addStop(
  page: Page,
  index: number,
  s: { name: string; lat: string; lon: string; arrive: string; depart: string; forest?: boolean },
) {
  await page.click(byTestId('stop-add'));
  await page.waitForSelector(byTestId('stop-form'));
  await page.fill(byTestId('stop-name'), s.name);
  await page.fill(byTestId('stop-lat'), s.lat);
  await page.fill(byTestId('stop-lon'), s.lon);
  // The browser's own date-and-time inputs take "YYYY-MM-DDTHH:MM".
  await page.fill(byTestId('stop-arrive'), s.arrive.replace(' ', 'T'));
  await page.fill(byTestId('stop-depart'), s.depart.replace(' ', 'T'));
  if (s.forest) await page.click(byTestId('stop-preset-deep-forest'));
  await page.click(byTestId('stop-save'));
  await page.waitForSelector(byTestId(`stop-${index}`));
  await page.waitForSelector(byTestId('stop-form'), { state: 'detached' });
}

/** The headline lowest charge as a number, once the budget has loaded. */
async function lowestCharge(page: Page): Promise<number> {
  await page.waitForSelector(byTestId('figure-lowest-value'));
  return Number((await page.textContent(byTestId('figure-lowest-value')))?.replace(/[^\d.]/g, ''));
}

describe('a trip leader at 1440 px', () => {
  it("when they build a trip from scratch and apply a flag's fix, then the flag goes", async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.desktop });
    const errors = trackPageErrors(page);
    await page.goto(suite.server.url);
    await page.click(byTestId('go-to-sign-up'));
    await page.fill(byTestId('sign-up-name'), LEADER.name);
    await page.fill(byTestId('sign-up-email'), LEADER.email);
    await page.fill(byTestId('sign-up-password'), LEADER.password);
    await page.click(byTestId('sign-up-submit'));
    await page.waitForSelector(byTestId('trips-empty'));

    // A new trip whose rig starts from a preset.
    await page.click(byTestId('trips-empty-new'));
    await page.waitForSelector(byTestId('new-trip-rig-preset:van-small'));
    await page.click(byTestId('new-trip-submit'));
    await expect.poll(() => page.textContent(byTestId('new-trip-form'))).toContain('Give the trip a name.');
    await page.fill(byTestId('new-trip-name'), TRIP);
    await page.fill(byTestId('new-trip-startDate'), '2027-10-04');
    await page.fill(byTestId('new-trip-endDate'), '2027-10-10');
    await page.click(byTestId('new-trip-timeZone-change'));
    await page.fill(byTestId('new-trip-timeZone-list-search'), 'London');
    await page.click(byTestId('new-trip-timeZone-list-option-Europe/London'));
    await page.click(byTestId('new-trip-rig-preset:van-small'));
    await page.click(byTestId('new-trip-submit'));
    await page.waitForSelector(byTestId('route-screen'));
    tripId = /\/trips\/([^/]+)/.exec(new URL(page.url()).pathname)?.[1] ?? '';
    expect(tripId).not.toBe('');

    // A bad latitude is refused on the field, and the rest of the typing is kept.
    await page.click(byTestId('stop-add'));
    await page.fill(byTestId('stop-name'), 'Birch hollow');
    await page.fill(byTestId('stop-lat'), '123');
    await page.click(byTestId('stop-save'));
    await expect.poll(() => page.textContent(byTestId('stop-form'))).toContain('Latitude runs from −90 to 90.');
    expect(await page.inputValue(byTestId('stop-name'))).toBe('Birch hollow');
    await page.click(byTestId('stop-cancel'));

    await addStop(page, 0, {
      name: 'Birch hollow',
      lat: '57.0',
      lon: '-4.0',
      arrive: '2027-10-04 14:00',
      depart: '2027-10-06 10:00',
    });
    await addStop(page, 1, {
      name: 'Deep glen',
      lat: '57.1',
      lon: '-4.2',
      arrive: '2027-10-06 13:00',
      depart: '2027-10-08 10:00',
      forest: true,
    });
    await addStop(page, 2, {
      name: 'Shore field',
      lat: '57.3',
      lon: '-4.5',
      arrive: '2027-10-08 13:00',
      depart: '2027-10-10 10:00',
    });
    await page.waitForSelector(byTestId('drive-1'));
    await page.click(byTestId('stop-1-edit'));
    await page.waitForSelector(byTestId('sun-path'));
    await screenshot(page, 'leader-route-desktop');
    await page.click(byTestId('stop-cancel'));

    await page.click(byTestId('tab-loads'));
    await page.waitForSelector(byTestId('loads-empty'));
    for (const key of ['fridge-12v-compressor', 'led-lights', 'laptop', 'tv', 'water-pump']) {
      await page.click(byTestId(`library-${key}`));
      await page.click(byTestId('appliance-save'));
      await page.waitForSelector(byTestId('schedule-editor'));
    }
    const loads = await page.textContent(byTestId('loads-screen'));
    for (const name of ['12 V compressor fridge', 'LED lights', 'Laptop', 'TV', 'Water pump'])
      expect(loads).toContain(name);
    await screenshot(page, 'leader-loads-desktop');

    // The flags' fixes are checked apart from the budget: asked for once the flags are shown.
    const fixesAsked: string[] = [];
    page.on('request', (r) => {
      if (r.url().includes('/budget/fixes')) fixesAsked.push(r.url());
    });
    await page.click(byTestId('tab-budget'));
    await page.waitForSelector(byTestId('flag-list'));
    await page.waitForSelector(`${byTestId('soc-chart')} canvas`);
    const shortfalls = page.locator('[data-testid^="flag-energy-short"], [data-testid^="flag-below-reserve"]');
    expect(await shortfalls.count()).toBeGreaterThan(0);
    /** Waits until the fixes of the budget on screen have arrived ("Checking fixes…" gone) and the flag offers one. */
    const fixesShown = async (flag: ReturnType<typeof shortfalls.first>) => {
      await expect.poll(() => page.locator(byTestId('fixes-loading')).count(), { timeout: 30_000 }).toBe(0);
      await flag.locator('[data-testid^="fix-"]').first().waitFor({ timeout: 30_000 });
    };
    await fixesShown(shortfalls.first());
    expect(fixesAsked.length).toBeGreaterThan(0);
    const shortBefore = Number((await page.textContent(byTestId('figure-short-value')))?.replace(/\D/g, ''));
    await screenshot(page, 'leader-budget-flag-desktop');
    // Two fixes in a row, then both undone newest first: the toast's Undo takes back the second, "Undo last fix"
    // the first, and the trip's records come back as they were, versions included, at 1440 px and at 360 px.
    const records = async () => {
      const detail = (await (await page.request.get(`${suite.server.url}/api/trips/${tripId}`)).json()) as {
        rig: unknown;
        stops: unknown;
        appliances: unknown;
      };
      return JSON.stringify({ rig: detail.rig, stops: detail.stops, appliances: detail.appliances });
    };
    const applyButtons = page.locator('[data-testid^="flag-"] [data-testid^="fix-"]:not([aria-disabled="true"])');
    const applyTwoThenUndoBoth = async (width: 'desktop' | 'phone') => {
      const asItWas = await records();
      const firstFlagId = (await shortfalls.first().getAttribute('data-testid')) ?? '';
      const listBefore = await page.textContent(byTestId('flag-list'));
      await applyButtons.first().click();
      await expect.poll(records, { timeout: 15_000 }).not.toBe(asItWas);
      const afterOne = await records();
      // The budget has moved on (the flag cleared or its figures changed) before the second fix is chosen.
      await expect.poll(() => page.textContent(byTestId('flag-list')), { timeout: 15_000 }).not.toBe(listBefore);
      await expect.poll(() => applyButtons.count(), { timeout: 15_000 }).toBeGreaterThan(0);
      await applyButtons.first().click();
      await expect.poll(records, { timeout: 15_000 }).not.toBe(afterOne);
      await expect.poll(() => page.textContent(byTestId('undo-last-fix-text'))).toContain('2 fixes can be undone');
      await screenshot(page, `leader-budget-two-fixes-${width}`);
      // What the reader was looking at stays where it was: the undo redraws the budget under them (a flag put back
      // above it pushes nothing out of view), and the screen does not start again from the top.
      // A small marked element fully in view inside the budget (a container would move with what is put back), and
      // not inside the flag list, whose contents the undo itself redraws.
      const seen = await page.evaluateHandle(() =>
        [...document.querySelectorAll('[data-testid="budget-screen"] [data-testid]')].find((el) => {
          const r = el.getBoundingClientRect();
          const steady = !el.closest('[data-testid="flag-list"]');
          return steady && r.top > 120 && r.bottom < window.innerHeight / 2 && r.height > 0 && r.height < 150;
        }),
      );
      const seenTop = () => seen.evaluate((el) => (el?.isConnected ? el.getBoundingClientRect().top : Number.NaN));
      const seenTopBefore = await seenTop();
      const scrolledTo = () => page.locator(byTestId('budget-screen')).evaluate((el) => el.scrollTop);
      const scrolledBefore = await scrolledTo();
      await page.click(byTestId('toast-action'));
      await expect.poll(records, { timeout: 15_000 }).toBe(afterOne);
      await expect.poll(() => page.textContent(byTestId('undo-last-fix-text'))).not.toContain('fixes can be undone');
      // Once the fixes are checked again, the tab is still scrolled where it was, at both widths (a flag put back in
      // the list shows where the reader is looking; nothing above it moves).
      await expect.poll(() => page.locator(byTestId('fixes-loading')).count(), { timeout: 30_000 }).toBe(0);
      expect(Math.abs((await scrolledTo()) - scrolledBefore)).toBeLessThan(60);
      if (!Number.isNaN(seenTopBefore)) expect(Math.abs((await seenTop()) - seenTopBefore)).toBeLessThan(60);
      await page.click(byTestId('undo-last-fix-button'));
      await expect.poll(records, { timeout: 15_000 }).toBe(asItWas);
      await page.waitForSelector(byTestId('undo-last-fix'), { state: 'detached', timeout: 15_000 });
      await expect.poll(() => page.locator(byTestId(firstFlagId)).count(), { timeout: 15_000 }).toBe(1);
      await expect
        .poll(async () => Number((await page.textContent(byTestId('figure-short-value')))?.replace(/\D/g, '')))
        .toBe(shortBefore);
      // After the undo the fixes are checked again for the budget as it was, and offered again.
      await fixesShown(page.locator(byTestId(firstFlagId)));
    };
    // "What it would take" marks one lever as the cheapest, in words a screen reader reads.
    const cheapest = page.locator(byTestId('what-it-would-take-cheapest'));
    await expect.poll(() => cheapest.count()).toBe(1);
    expect(await cheapest.textContent()).toBe('Cheapest');
    expect(await cheapest.getAttribute('aria-label')).toBe('cheapest of these levers');
    await shootAt(page, 'what-it-would-take', 'leader-what-it-would-take-desktop');
    await applyTwoThenUndoBoth('desktop');
    await page.setViewportSize(VIEWPORTS.phone);
    await expect.poll(() => cheapest.count()).toBe(1);
    await shootAt(page, 'what-it-would-take', 'leader-what-it-would-take-phone');
    await applyTwoThenUndoBoth('phone');
    await page.setViewportSize(VIEWPORTS.desktop);
    await screenshot(page, 'leader-budget-undone-desktop');
    // A hookup fix books the supply usual in the stop's country unless another is picked: the pick is checked on the
    // device before Apply, and Apply books that supply.
    await fixesShown(shortfalls.first());
    const supplyOpen = page.locator('[data-testid^="hookup-supply-"][data-testid$="-open"]').first();
    const pickerId = ((await supplyOpen.getAttribute('data-testid')) ?? '').replace(/-open$/, '');
    await supplyOpen.click();
    const picked = page.locator(`[data-testid="${pickerId}"] [role="radio"]`).nth(1);
    const [amps, volts] = ((await picked.getAttribute('data-testid')) ?? '').replace(`${pickerId}-`, '').split('A-');
    await picked.click();
    await expect
      .poll(() => page.textContent(byTestId(`${pickerId}-check`)))
      .toMatch(
        new RegExp(`^With ${amps} A at ${volts?.replace('V', '')} V: (clears this flag|helps, not enough alone)`),
      );
    const beforeHookup = await records();
    const headlineBeforeHookup = await page.textContent(byTestId('headline-figures'));
    await page.click(byTestId(pickerId.replace(/^hookup-supply-/, 'fix-')));
    await expect.poll(records, { timeout: 15_000 }).not.toBe(beforeHookup);
    await expect
      .poll(() => page.textContent(byTestId('headline-figures')), { timeout: 15_000 })
      .not.toBe(headlineBeforeHookup);
    const booked = JSON.parse(await records()) as {
      stops: { stop: { hookup: { amps: number; volts: number } | null } }[];
    };
    expect(booked.stops.map((s) => s.stop.hookup)).toContainEqual({
      amps: Number(amps),
      volts: Number(volts?.replace('V', '')),
    });
    await page.click(byTestId('toast-action'));
    await expect.poll(records, { timeout: 15_000 }).toBe(beforeHookup);
    // The budget on screen is the undone plan's again (not the hooked-up one's, still shown for a moment) before the
    // next fixes are read from it.
    await expect
      .poll(() => page.textContent(byTestId('headline-figures')), { timeout: 15_000 })
      .toBe(headlineBeforeHookup);
    // Apply the first flag's first fix a few times: fixes are capped at what the rig can carry, so each one must
    // lower the energy short, and the ones that clear their flag remove it.
    let shortNow = shortBefore;
    for (let round = 0; round < 3 && (await shortfalls.count()) > 0; round++) {
      const flag = shortfalls.first();
      await fixesShown(flag);
      const clears = !((await flag.textContent()) ?? '').includes('helps, not enough alone');
      const flagId = (await flag.getAttribute('data-testid')) ?? '';
      await flag.locator('[data-testid^="fix-"]').first().click();
      if (clears) await expect.poll(() => page.locator(byTestId(flagId)).count(), { timeout: 15_000 }).toBe(0);
      const before = shortNow;
      await expect
        .poll(async () => Number((await page.textContent(byTestId('figure-short-value')))?.replace(/\D/g, '')), {
          timeout: 15_000,
        })
        .toBeLessThan(before);
      shortNow = Number((await page.textContent(byTestId('figure-short-value')))?.replace(/\D/g, ''));
    }
    await screenshot(page, 'leader-budget-fixed-desktop');
    expect(errors).toEqual([]);
    await page.close();
  });

  it("when they set an advanced rig figure and pick a stop's zone from the list, then both are there after a reload", async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.desktop });
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, LEADER.email, LEADER.password);
    await page.goto(`${suite.server.url}/trips/${tripId}/rig`);
    await page.waitForSelector(byTestId('rig-form'));
    // Less idle draw than the preset's, so the plan the flag fixes made to hold still holds for the crew test.
    await page.click(byTestId('rig-inverter-advanced'));
    // A refused figure inside a closed "Advanced" opens it again on Save, so the message is seen beside its field.
    await page.fill(byTestId('rig-inverter-idle'), '-5');
    await page.click(byTestId('rig-inverter-advanced'));
    expect(await page.locator(byTestId('rig-inverter-idle')).count()).toBe(0);
    await page.click(byTestId('rig-save'));
    await page.waitForSelector(`${byTestId('rig-inverter-idle')}[aria-invalid="true"]`);
    await page.fill(byTestId('rig-inverter-idle'), '6');
    await page.click(byTestId('rig-save'));
    await expect.poll(() => page.textContent(byTestId('toast'))).toContain('Rig saved');
    await page.reload();
    await page.waitForSelector(byTestId('rig-form'));
    await page.click(byTestId('rig-inverter-advanced'));
    // The device's saved copy can show first; the server's answer follows.
    await expect.poll(() => page.inputValue(byTestId('rig-inverter-idle')), { timeout: 15_000 }).toBe('6');
    expect(await page.getAttribute(byTestId('rig-inverter-mode-on-demand'), 'aria-checked')).toBe('true');

    // Dublin keeps the same clock as London in October, so the stop's times stay valid in the new zone.
    await page.click(byTestId('tab-route'));
    await page.click(byTestId('stop-0-edit'));
    await page.click(byTestId('stop-time-zone-change'));
    await page.keyboard.type('dubl');
    await page.click(byTestId('stop-time-zone-list-option-Europe/Dublin'));
    expect(await page.textContent(byTestId('stop-time-zone-value'))).toContain('Europe/Dublin');
    await page.click(byTestId('stop-save'));
    await page.waitForSelector(byTestId('stop-form'), { state: 'detached' });
    await page.reload();
    await page.click(byTestId('stop-0-edit'));
    // The device's saved copy can show first; the server's answer follows.
    await expect
      .poll(() => page.textContent(byTestId('stop-time-zone-value')), { timeout: 15_000 })
      .toContain('Europe/Dublin');
    expect(errors).toEqual([]);
    await page.close();
  });
});

describe('members of the trip', () => {
  beforeAll(() => {
    // There is no invitation flow yet: memberships are written straight into the server's database.
    const db = openDatabase(suite.server.dbPath);
    for (const [email, role] of [
      [DEMO_CREW.email, 'crew'],
      [DEMO_VIEWER.email, 'viewer'],
    ] as const) {
      const row = db.select({ id: user.id }).from(user).where(eq(user.email, email)).get();
      if (!row) throw new Error(`no seeded user ${email}`);
      addMember(db, tripId, row.id, role, new Date());
    }
    db.$client.close();
  });

  it('when a crew member at 360 px lengthens a routine, then the lowest charge changes', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_CREW.email, DEMO_CREW.password);
    await openTrip(page, TRIP);
    const before = await lowestCharge(page);

    await page.click(byTestId('tab-loads'));
    await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'Laptop' }).first().click();
    await page.waitForSelector(byTestId('routine-strip'));
    // A drag across the morning cells paints them all; a tap adds one more.
    await page.locator(byTestId('routine-strip-cell-11')).scrollIntoViewIfNeeded();
    const from = await page.locator(byTestId('routine-strip-cell-8')).boundingBox();
    const to = await page.locator(byTestId('routine-strip-cell-11')).boundingBox();
    if (!from || !to) throw new Error('routine cells not laid out');
    await page.mouse.move(from.x + from.width / 2, from.y + from.height / 2);
    await page.mouse.down();
    await page.mouse.move(to.x + to.width / 2, to.y + to.height / 2, { steps: 8 });
    await page.mouse.up();
    for (const hour of [8, 9, 10, 11])
      expect(await page.getAttribute(byTestId(`routine-strip-cell-${hour}`), 'aria-checked')).toBe('true');
    await page.click(byTestId('routine-strip-cell-13'));
    expect(await page.getAttribute(byTestId('routine-strip-cell-13'), 'aria-checked')).toBe('true');
    expect(await page.getAttribute(byTestId('routine-strip-cell-12'), 'aria-checked')).toBe('false');
    await expect.poll(() => page.textContent(byTestId('routine-preview'))).toContain('Lowest charge with this routine');
    await screenshot(page, 'crew-routine-phone');
    await page.click(byTestId('schedule-save'));
    await expect.poll(() => page.textContent(byTestId('toast'))).toContain('Routine saved');

    await page.click(byTestId('tab-budget'));
    await expect.poll(() => lowestCharge(page), { timeout: 15_000 }).toBeLessThan(before);
    // Crew may edit loads but not the route.
    await page.click(byTestId('tab-route'));
    await page.waitForSelector(byTestId('route-read-only'));
    expect(await page.locator(byTestId('stop-add')).count()).toBe(0);
    expect(errors).toEqual([]);
    await page.close();
  });

  it('when a viewer opens the trip, then nothing offers an edit', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    await signIn(page, suite.server.url, DEMO_VIEWER.email, DEMO_VIEWER.password);
    await openTrip(page, TRIP);
    await page.waitForSelector(byTestId('budget-screen'));
    expect(await page.locator('[data-testid^="fix-"]').count()).toBe(0);
    expect(await page.locator('[data-testid^="what-if-keep-"]').count()).toBe(0);
    await page.click(byTestId('tab-loads'));
    await page.waitForSelector(byTestId('loads-read-only'));
    expect(await page.locator(byTestId('add-appliance')).count()).toBe(0);
    await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'Laptop' }).first().click();
    await page.waitForSelector(byTestId('routine-strip'));
    expect(await page.locator(byTestId('schedule-save')).count()).toBe(0);
    expect(await page.locator(byTestId('routine-strip-cell-3')).getAttribute('aria-disabled')).toBe('true');
    await page.click(byTestId('tab-rig'));
    await page.waitForSelector(byTestId('rig-read-only'));
    expect(await page.locator(byTestId('rig-save')).count()).toBe(0);
    await screenshot(page, 'viewer-rig-phone');
    // The server refuses a viewer's write even if a screen were to offer one.
    const status = await page.evaluate(
      async (id) =>
        (
          await fetch(`/api/trips/${id}`, {
            method: 'PATCH',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({ version: 1, name: 'Hijack' }),
          })
        ).status,
      tripId,
    );
    expect(status).toBe(403);
    await page.close();
  });
});

describe('two people editing at once', () => {
  it('when a save meets a newer version, then the second editor is told and can keep theirs', async () => {
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop });
    const first = await context.newPage();
    await signIn(first, suite.server.url, LEADER.email, LEADER.password);
    await openTrip(first, TRIP);
    const second = await context.newPage();
    await second.goto(first.url());
    for (const page of [first, second]) {
      await page.waitForSelector(byTestId('trip-frame'));
      await page.click(byTestId('tab-loads'));
      await page.locator('[data-testid^="appliance-"]').filter({ hasText: 'TV' }).first().click();
      await page.waitForSelector(byTestId('appliance-form'));
    }
    await first.fill(byTestId('appliance-runningW'), '120');
    await first.click(byTestId('appliance-save'));
    await expect.poll(() => first.textContent(byTestId('toast'))).toContain('saved');

    await second.fill(byTestId('appliance-runningW'), '80');
    await second.click(byTestId('appliance-save'));
    await second.waitForSelector(byTestId('appliance-conflict'));
    expect(await second.textContent(byTestId('appliance-conflict'))).toContain(
      'changed by someone else since you opened it',
    );
    // What they typed is still in the form while they decide.
    expect(await second.inputValue(byTestId('appliance-runningW'))).toBe('80');
    expect(await second.textContent(byTestId('appliance-conflict-theirs'))).toContain('running 120 W');
    await screenshot(second, 'conflict-desktop');
    await second.click(byTestId('appliance-conflict-keep-mine'));
    await second.waitForSelector(byTestId('appliance-conflict'), { state: 'detached' });
    await first.reload();
    await first.waitForSelector(byTestId('trip-frame'));
    await first.click(byTestId('tab-loads'));
    await expect.poll(() => first.textContent(byTestId('circuit-ac')), { timeout: 15_000 }).toContain('80 W');
    await context.close();
  });
});

describe('the trips list', () => {
  it('when a trip is duplicated and then deleted, then undo brings it back and a confirmed delete removes it', async () => {
    const page = await suite.browser.newPage({ viewport: VIEWPORTS.phone });
    await signIn(page, suite.server.url, LEADER.email, LEADER.password);
    const original = page.locator('[data-testid^="trip-card-"]').filter({ hasText: TRIP });
    const id = ((await original.first().getAttribute('data-testid')) ?? '').replace('trip-card-', '');
    await page.click(byTestId(`trip-duplicate-${id}`));
    await expect.poll(() => page.locator('[data-testid^="trip-open-"]').count()).toBe(2);
    const ids = (
      await page
        .locator('[data-testid^="trip-card-"]')
        .evaluateAll((els) => els.map((el) => el.getAttribute('data-testid') ?? ''))
    ).map((t) => t.replace('trip-card-', ''));
    const copyId = ids.find((other) => other !== id) ?? '';
    expect(copyId).not.toBe('');

    await page.click(byTestId(`trip-delete-${copyId}`));
    await page.click(byTestId(`trip-delete-confirm-${copyId}`));
    await expect.poll(() => page.locator(byTestId(`trip-card-${copyId}`)).count()).toBe(0);
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => page.locator(byTestId(`trip-card-${copyId}`)).count()).toBe(1);

    await page.click(byTestId(`trip-delete-${copyId}`));
    await page.click(byTestId(`trip-delete-confirm-${copyId}`));
    // After the undo window the server has deleted it: a fresh load no longer lists it.
    await page.waitForTimeout(7000);
    await page.reload();
    await page.waitForSelector(byTestId('trip-list'));
    expect(await page.locator(byTestId(`trip-card-${copyId}`)).count()).toBe(0);
    expect(await page.locator(byTestId(`trip-card-${id}`)).count()).toBe(1);
    await page.close();
  });
});
