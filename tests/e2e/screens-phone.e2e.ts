// Every screen at 360 × 800 (see screen-sweep.ts), then what only a phone needs: the chart's bytes fetched at idle
// after sign-in, and a tab row that says it scrolls.
import { describe, expect, it } from 'vitest';
import { byTestId, trackPageErrors, useServerAndBrowser, VIEWPORTS } from './harness';
import { go, sweepScreens } from './screen-sweep';

const suite = useServerAndBrowser();

describe('every screen on a phone', () => {
  it('when each screen is opened at 360 px, then nothing overflows or overlaps, axe finds nothing serious, and the tab row shows it scrolls', async () => {
    // axe needs a page from an explicit context.
    const context = await suite.browser.newContext({ viewport: VIEWPORTS.phone });
    const page = await context.newPage();
    const errors = trackPageErrors(page);

    // The chart's bytes: none while signed out; once signed in, the wasm and the chart's chunk are fetched at idle
    // on the Trips screen, so a trip opened later draws at once.
    const chartRequests: string[] = [];
    page.on('request', (r) => {
      const url = r.url();
      if (/\/canvaskit-[0-9a-f]+\.wasm$/.test(url)) chartRequests.push('wasm');
      else if (/\/soc-chart-chunk[^/]*\.js$/.test(url)) chartRequests.push('chart chunk');
    });
    const { paths, problems, violations } = await sweepScreens(
      suite,
      page,
      'phone',
      () => expect(chartRequests).toEqual([]),
      () => expect.poll(() => [...new Set(chartRequests)].sort(), { timeout: 15_000 }).toEqual(['chart chunk', 'wasm']),
    );
    // Joined so a failure lists every problem, not the first few.
    expect(problems.join('\n')).toBe('');
    expect(violations).toEqual([]);

    // The trip's tab row says that it scrolls, and the last tabs can be reached.
    await go(page, paths.base + paths.trip, 'trip-frame');
    await page.waitForSelector(byTestId('trip-tabs-more-right'));
    await page.click(byTestId('trip-tabs-more-right'));
    await page.click(byTestId('tab-ledger'));
    await page.waitForSelector(byTestId('ledger-list'));
    await page.waitForSelector(byTestId('trip-tabs-more-left'));
    expect(errors).toEqual([]);
    await context.close();
  }, 240_000);
});
