// The worker pools run under the Node options `npm start` gives the server (a heap bound, tsx's loader), not only
// under the test runner: a worker handed the server's own options refuses to start, and the request fails.
import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { startScriptNodeArgs } from '../e2e/server-process';

const PREVIEW = `
const fs = require('node:fs');
const { previewGpx, closeGpxPool } = require('./server/places/gpx-pool.ts');
previewGpx({
  text: fs.readFileSync('tests/fixtures/gpx/four-waypoints-track.gpx', 'utf8'),
  trip: { startDate: '2027-06-01', endDate: '2027-06-08', timeZone: 'Europe/London' },
  speedKmh: 60,
  replaces: 0,
}).then(async (preview) => {
  process.stdout.write(JSON.stringify({ stops: preview.stops.length }));
  await closeGpxPool();
});
`;

describe('worker threads under the start options', () => {
  it('when the server runs as npm start runs it, then a GPX file is read in its worker', () => {
    const args = startScriptNodeArgs();
    expect(args.some((a) => a.startsWith('--max-old-space-size'))).toBe(true);
    const out = execFileSync(process.execPath, [...args, '-e', PREVIEW], { encoding: 'utf8', timeout: 60_000 });
    expect(JSON.parse(out)).toEqual({ stops: 4 });
  });
});
