// Every screen at 1440 × 900 (see screen-sweep.ts), then the chart's readout and zoom, a routine's start and
// length, a toast that covers no button, and the ledger's CSV.
import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import { byTestId, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';
import { openCheck, sweepScreens } from './screen-sweep';

const suite = useServerAndBrowser();

describe('every screen on a laptop', () => {
  it('when each screen is opened at 1440 px, then nothing overflows or overlaps and axe finds nothing serious, and the chart, a routine and the ledger work', async () => {
    // axe needs a page from an explicit context.
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.desktop, acceptDownloads: true });
    const page = await context.newPage();
    const errors = trackPageErrors(page);
    const { paths, hours, problems, violations } = await sweepScreens(suite, page, 'desktop');
    // Joined so a failure lists every problem, not the first few.
    expect(problems.join('\n')).toBe('');
    expect(violations).toEqual([]);

    // Pointing at the chart shows that hour's figures; the hour buttons do the same from a keyboard.
    await openCheck('budget', page, paths);
    const canvas = page.locator(`${byTestId('soc-chart')} canvas`).first();
    await canvas.scrollIntoViewIfNeeded();
    const box = await canvas.boundingBox();
    if (!box) throw new Error('no chart canvas');
    await page.mouse.move(box.x + box.width * 0.4, box.y + box.height / 2);
    // Place and charge come with the budget; the hour's other figures arrive with the ledger, fetched on first use.
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ % · solar .+ available/);
    await page.click(byTestId('soc-next-hour'));
    await expect.poll(() => page.textContent(byTestId('soc-readout'))).toMatch(/charge \d+ %/);

    // Zooming into one day narrows the drawn range to that day; "All" brings the whole trip back.
    await page.click(byTestId('soc-range-day-1'));
    await expect
      .poll(() => page.locator(byTestId('soc-chart')).getAttribute('data-from'))
      .toMatch(/^\d{4}-\d{2}-\d{2}T00:00/);
    await page.click(byTestId('soc-range-all'));
    await expect.poll(() => page.locator(byTestId('soc-chart')).getAttribute('data-to')).toBe(hours.last);

    // A routine window's start and length are set apart, and the window is said in words. Saving shows a toast that
    // covers no button.
    await openCheck('loads-routine', page, paths);
    const words = () => page.textContent(byTestId('window-0-words'));
    await expect.poll(words).toBe('07:30–07:40, 10 min, camp days');
    await page.fill(byTestId('window-minutes-0'), '15');
    await expect.poll(words).toBe('07:30–07:45, 15 min, camp days');
    await page.fill(byTestId('window-start-0'), '07:45');
    await expect.poll(words).toBe('07:45–08:00, 15 min, camp days');
    await expect.poll(() => page.textContent(byTestId('routine-preview-words'))).toContain('07:45–08:00, 15 min');
    await page.click(byTestId('schedule-save'));
    await page.waitForSelector(byTestId('toast'));
    const covered = await page.evaluate(() => {
      const toast = document.querySelector('[data-testid="toast"]')?.getBoundingClientRect();
      if (!toast) return ['no toast'];
      return [...document.querySelectorAll('[role="button"], button, a')]
        .filter((el) => !el.closest('[data-testid="toast"]'))
        .filter((el) => {
          const r = el.getBoundingClientRect();
          return (
            r.width > 0 && r.left < toast.right && r.right > toast.left && r.top < toast.bottom && r.bottom > toast.top
          );
        })
        .map((el) => el.getAttribute('aria-label') ?? el.textContent ?? '');
    });
    expect(covered).toEqual([]);

    // The hourly ledger downloads as CSV with a header row.
    await page.click(byTestId('tab-ledger'));
    await page.click(byTestId('ledger-short-short'));
    const [download] = await Promise.all([page.waitForEvent('download'), page.click(byTestId('ledger-csv'))]);
    const csv = fs.readFileSync(await download.path(), 'utf8');
    expect(csv.split('\r\n')[0]).toContain('state of charge %');
    expect(csv.split('\r\n').length).toBeGreaterThan(2);
    expect(errors).toEqual([]);
    await context.close();
  }, 240_000);
});
