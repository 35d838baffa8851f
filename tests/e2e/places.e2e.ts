// Places, the route map and the trip's files in a real browser, at 360 × 800 and 1440 × 900: a route laid out
// by typing place names only, typed coordinates, a pin dragged, placed and nudged from the keyboard, a GPX file
// imported with its preview, GPX and calendar downloads, a calendar subscription, and the printed trip sheet.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import ICAL from 'ical.js';
import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import type { TripDetail } from '@/shared/schemas/api';
import {
  byTestId,
  SCREENSHOT_DIR,
  screenshotTall,
  signIn,
  trackPageErrors,
  useServerAndBrowser,
  VIEWPORTS,
} from './harness';

const suite = useServerAndBrowser();
const FIXTURE = path.resolve(__dirname, '..', 'fixtures', 'gpx', 'four-waypoints-track.gpx');
type Width = keyof typeof VIEWPORTS;

async function open(width: Width, timezoneId = 'Europe/London'): Promise<{ context: BrowserContext; page: Page }> {
  const context = await suite.browser.newContext({ viewport: VIEWPORTS[width], timezoneId, acceptDownloads: true });
  return { context, page: await context.newPage() };
}

/** Same-origin API calls from the page's own cookie jar, as the app makes them. */
const api = (page: Page) => ({
  get: async <T>(url: string) => (await (await page.request.get(`${suite.server.url}${url}`)).json()) as T,
  post: async <T>(url: string, data: unknown) =>
    (await (
      await page.request.post(`${suite.server.url}${url}`, { data, headers: { Origin: suite.server.url } })
    ).json()) as T,
});

async function highlandId(page: Page): Promise<string> {
  const { trips } = await api(page).get<{ trips: { id: string; name: string }[] }>('/api/trips');
  return trips.find((t) => t.name === 'Highland loop')?.id ?? '';
}

/** A PDF's page count, from its page objects. */
const pdfPages = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g) ?? []).length;

async function drag(page: Page, testID: string, dx: number, dy: number): Promise<void> {
  // The mouse does not scroll: bring the marker on screen first.
  await page.locator(byTestId(testID)).scrollIntoViewIfNeeded();
  const box = await page.locator(byTestId(testID)).boundingBox();
  if (!box) throw new Error(`no ${testID} on screen`);
  const x = box.x + box.width / 2;
  const y = box.y + box.height / 2;
  await page.mouse.move(x, y);
  await page.mouse.down();
  await page.mouse.move(x + dx, y + dy, { steps: 10 });
  await page.mouse.up();
}

describe('a route from place names', () => {
  it('when a leader types only place names at 1440 px, then five stops are laid out with their zones and drives sized from the distance', async () => {
    const { context, page } = await open('desktop');
    const errors = trackPageErrors(page);
    await page.goto(suite.server.url);
    const signUp = await page.request.post(`${suite.server.url}/api/auth/sign-up/email`, {
      data: { name: 'Morag Leader', email: 'morag@example.test', password: 'correct-horse-battery' },
      headers: { Origin: suite.server.url },
    });
    expect(signUp.status()).toBe(200);
    await page.goto(suite.server.url);
    await page.click(byTestId('trips-empty-new'));
    await page.waitForSelector(byTestId('new-trip-rig-preset:caravan-lithium'));
    // The home time zone comes from the browser and is changed from the list, never typed.
    expect(await page.textContent(byTestId('new-trip-timeZone-value'))).toContain('Europe/London');
    await page.fill(byTestId('new-trip-name'), 'West coast week');
    await page.fill(byTestId('new-trip-startDate'), '2027-09-12');
    await page.fill(byTestId('new-trip-endDate'), '2027-09-19');
    await page.click(byTestId('new-trip-rig-preset:caravan-lithium'));
    await page.click(byTestId('new-trip-submit'));
    await page.waitForSelector(byTestId('route-screen'));

    const places = [
      ['Fort Wil', 'Fort William'],
      ['Oban', 'Oban'],
      ['Portree', 'Portree'],
      ['Ullapool', 'Ullapool'],
      ['Invernes', 'Inverness'],
    ];
    for (const [i, [typed, name]] of places.entries()) {
      await page.click(byTestId('stop-add'));
      await page.fill(byTestId('stop-name'), typed ?? '');
      const first = page.locator(byTestId('stop-name-suggestion-0'));
      await expect.poll(() => first.textContent(), { timeout: 10_000 }).toContain(`${name}Scotland, United Kingdom`);
      await first.click();
      expect(await page.inputValue(byTestId('stop-name'))).toBe(name);
      expect(Number(await page.inputValue(byTestId('stop-lat')))).toBeGreaterThan(55);
      await page.click(byTestId('stop-save'));
      await page.waitForSelector(byTestId(`stop-${i}`));
      await page.waitForSelector(byTestId('stop-form'), { state: 'detached' });
    }
    await page.waitForSelector(byTestId('route-map-marker-4'));
    const tripId = /\/trips\/([^/]+)/.exec(new URL(page.url()).pathname)?.[1] ?? '';
    const detail = await api(page).get<TripDetail>(`/api/trips/${tripId}`);
    expect(detail.stops.map((s) => s.stop.name)).toEqual(places.map(([, name]) => name));
    expect(detail.stops.every((s) => s.stop.timeZone === 'Europe/London')).toBe(true);
    expect(detail.drives).toHaveLength(4);
    for (const { drive } of detail.drives) {
      expect(drive.distanceSource).toBe('great-circle');
      expect(drive.distanceKm ?? 0).toBeGreaterThan(20);
      expect(drive.hoursSource).toBe('suggested');
    }
    expect(await page.textContent(byTestId('drive-0-summary'))).toMatch(/\d+ km \(straight line × road factor\)/);
    await screenshotTall(page, 'places-typed-route-desktop');
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe.each(['phone', 'desktop'] as const)('the route map at %s width', (width) => {
  it('when coordinates are typed, a pin is dragged, placed and nudged, then each proposes a position to save', async () => {
    const { context, page } = await open(width);
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const tripId = await highlandId(page);
    await page.goto(`${suite.server.url}/trips/${tripId}/route`);
    await page.waitForSelector(byTestId('route-map-marker-1'));

    // Typed coordinates, in degrees and minutes: that point, with the towns near it.
    await page.click(byTestId('stop-add'));
    await page.fill(byTestId('stop-name'), "57°07'N 5°20'W");
    const point = page.locator(byTestId('stop-name-suggestion-0'));
    await expect.poll(() => point.textContent(), { timeout: 10_000 }).toContain('Use 57.11667, -5.33333');
    await point.click();
    expect(await page.inputValue(byTestId('stop-lat'))).toBe('57.11667');
    expect(await page.inputValue(byTestId('stop-lon'))).toBe('-5.33333');
    expect(await page.inputValue(byTestId('stop-name'))).toMatch(/^Pitch near /);
    await page.waitForSelector(byTestId('stop-nearest-towns'));
    await page.click(byTestId('stop-cancel'));

    // Drag: the move is proposed, with the nearest towns, and saved only when asked.
    const before = (await api(page).get<TripDetail>(`/api/trips/${tripId}`)).stops[1]?.stop;
    await page.waitForSelector(byTestId('route-map-marker-1'));
    await drag(page, 'route-map-marker-1', 24, -18);
    await page.waitForSelector(byTestId('route-map-pending'));
    expect(await page.textContent(byTestId('route-map-pending'))).toContain('Move Glen Carrach pinewood to');
    await page.click(byTestId('route-map-pending-save'));
    await page.waitForSelector(byTestId('route-map-pending'), { state: 'detached' });
    const after = (await api(page).get<TripDetail>(`/api/trips/${tripId}`)).stops[1]?.stop;
    expect(after?.lat).toBeGreaterThan(before?.lat ?? 90);
    expect(after?.lon).toBeGreaterThan(before?.lon ?? 180);

    // Place pin: open a stop from its marker, then tap the map.
    await page.click(byTestId('route-map-marker-0'));
    await page.waitForSelector(byTestId('stop-editor'));
    await page.click(byTestId('route-map-place-pin'));
    await page.locator(byTestId('route-map')).scrollIntoViewIfNeeded();
    const map = await page.locator(byTestId('route-map')).boundingBox();
    if (!map) throw new Error('no map');
    await page.mouse.click(map.x + map.width * 0.3, map.y + map.height * 0.7);
    await page.waitForSelector(byTestId('route-map-pending'));
    expect(await page.textContent(byTestId('route-map-pending'))).toContain('Move Lochan Mhor lochside pitch to');
    await page.click(byTestId('route-map-pending-cancel'));

    // The keyboard: arrow keys move a focused marker.
    await page.locator(byTestId('route-map-marker-2')).focus();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('Shift+ArrowUp');
    await page.waitForSelector(byTestId('route-map-pending'));
    expect(await page.textContent(byTestId('route-map-pending'))).toContain('Move Rubha Sgeir coastal field to');
    await page.click(byTestId('route-map-pending-cancel'));
    await screenshotTall(page, `places-map-${width}`);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('when a GPX file is imported, then the preview comes first; the trip then goes out as GPX, a calendar and a printed sheet', async () => {
    const { context, page } = await open(width);
    const errors = trackPageErrors(page);
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    const created = await api(page).post<TripDetail>('/api/trips', {
      name: `Glen and shore ${width}`,
      startDate: '2027-06-01',
      endDate: '2027-06-08',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
    });
    const tripId = created.trip.id;
    await page.goto(`${suite.server.url}/trips/${tripId}/route`);

    // Import: nothing is saved until the preview is confirmed.
    const [chooser] = await Promise.all([page.waitForEvent('filechooser'), page.click(byTestId('gpx-import-choose'))]);
    await chooser.setFiles(FIXTURE);
    await page.waitForSelector(byTestId('gpx-preview'));
    const preview = (await page.textContent(byTestId('gpx-preview'))) ?? '';
    expect(preview).toContain('4 stops and 3 drives');
    expect(preview).toContain('Lochan Dubh pitch');
    expect(preview).toContain('127.0 km along the track');
    expect((await api(page).get<TripDetail>(`/api/trips/${tripId}`)).stops).toHaveLength(0);
    await screenshotTall(page, `places-gpx-preview-${width}`);
    await page.click(byTestId('gpx-import-confirm'));
    await page.waitForSelector(byTestId('stop-3'));
    expect(await page.textContent(byTestId('drive-0-summary'))).toContain('127 km (measured along the GPX track)');

    // GPX export.
    const [gpx] = await Promise.all([page.waitForEvent('download'), page.click(byTestId('gpx-export'))]);
    expect(gpx.suggestedFilename()).toMatch(/\.gpx$/);
    const gpxText = fs.readFileSync((await gpx.path()) ?? '', 'utf8');
    expect(gpxText).toContain('version="1.1"');
    expect(gpxText.match(/<wpt /g)).toHaveLength(4);
    expect(gpxText.match(/<rte>/g)).toHaveLength(3);

    // Calendar file: one event per stop and per drive.
    const [ics] = await Promise.all([page.waitForEvent('download'), page.click(byTestId('calendar-download'))]);
    const calendar = new ICAL.Component(ICAL.parse(fs.readFileSync((await ics.path()) ?? '', 'utf8')));
    const summaries = calendar.getAllSubcomponents('vevent').map((e) => String(e.getFirstPropertyValue('summary')));
    expect(summaries).toContain('1. Lochan Dubh pitch');
    expect(summaries.filter((s) => s.startsWith('Drive:'))).toHaveLength(3);

    // Subscription: an address that works without a session.
    await page.click(byTestId('calendar-subscribe-open'));
    await page.click(byTestId('calendar-feed-create'));
    const url = (await page.locator(byTestId('calendar-feed-url')).textContent()) ?? '';
    const outsider = await suite.browser.newContext();
    const feed = await outsider.request.get(url);
    expect(feed.status()).toBe(200);
    expect(await feed.text()).toContain('BEGIN:VCALENDAR');
    await outsider.close();

    // The trip sheet opens from the route and prints on A4.
    await page.click(byTestId('trip-sheet-open'));
    await page.waitForSelector(byTestId('trip-sheet'));
    await page.waitForSelector(`${byTestId('trip-sheet-map')} svg`);
    await screenshotTall(page, `places-trip-sheet-${width}`);
    expect(pdfPages(await page.pdf({ format: 'A4', printBackground: true }))).toBeLessThanOrEqual(2);
    expect(errors).toEqual([]);
    await context.close();
  });
});

describe('the Highland demo’s trip sheet', () => {
  it('when printed on A4 or US Letter, then it takes at most two pages', async () => {
    const { context, page } = await open('desktop');
    await signIn(page, suite.server.url, DEMO_ACCOUNT.email, DEMO_ACCOUNT.password);
    await page.goto(`${suite.server.url}/trip-sheet/${await highlandId(page)}`);
    await page.waitForSelector(byTestId('trip-sheet-flags'));
    await page.waitForSelector(`${byTestId('trip-sheet-map')} svg`);
    for (const format of ['A4', 'Letter'] as const) {
      const file = path.join(SCREENSHOT_DIR, `trip-sheet-highland-${format.toLowerCase()}.pdf`);
      const pdf = await page.pdf({ path: file, format, printBackground: true });
      expect(pdfPages(pdf)).toBeLessThanOrEqual(2);
      // Pages as pictures for review, where poppler is installed.
      try {
        execFileSync('pdftoppm', ['-png', '-r', '80', file, file.replace(/\.pdf$/, '')]);
      } catch {
        // Without pdftoppm the PDF itself is left for review.
      }
    }
    await context.close();
  });
});
