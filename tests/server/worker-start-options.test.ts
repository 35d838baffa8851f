// The worker pools run under the Node options `npm start` gives the server (a heap bound), not only under the test
// runner: a worker handed the server's own options refuses to start, and the request fails. `npm start` runs the
// compiled server, whose threads start from compiled workers beside it without tsx; `npm run dev` runs the sources,
// whose threads register tsx first. Both are checked here.
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNT } from '@/db/seed';
import { SERVER_BUNDLE } from '@/scripts/build-server';
import { PASSWORD_MESSAGES } from '@/shared/password-strength';
import { startScriptNodeArgs, startServer, type RunningServer } from '../e2e/server-process';

const GPX_FILE = 'tests/fixtures/gpx/four-waypoints-track.gpx';

const PREVIEW = `
const fs = require('node:fs');
const { previewGpx, closeGpxPool } = require('./server/places/gpx-pool.ts');
previewGpx({
  text: fs.readFileSync('${GPX_FILE}', 'utf8'),
  trip: { startDate: '2027-06-01', endDate: '2027-06-08', timeZone: 'Europe/London' },
  speedKmh: 60,
  replaces: 0,
}).then(async (preview) => {
  process.stdout.write(JSON.stringify({ stops: preview.stops.length }));
  await closeGpxPool();
});
`;

describe('worker threads under the start options', () => {
  it('when the server runs from its sources under the start options, then a GPX file is read in its worker', () => {
    const args = startScriptNodeArgs();
    expect(args.some((a) => a.startsWith('--max-old-space-size'))).toBe(true);
    const out = execFileSync(process.execPath, [...args, '--require', 'tsx/cjs', '-e', PREVIEW], {
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(JSON.parse(out)).toEqual({ stops: 4 });
  });
});

describe('the compiled server, run as npm start runs it', () => {
  let server: RunningServer;
  let cookie = '';
  let tripId = '';
  const call = (route: string, init: RequestInit = {}) =>
    fetch(`${server.url}${route}`, {
      ...init,
      headers: { Cookie: cookie, Origin: server.url, ...(init.headers as Record<string, string> | undefined) },
    });

  beforeAll(async () => {
    server = await startServer({ LOG_LEVEL: 'silent' });
    const signIn = await call('/api/auth/sign-in/email', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: DEMO_ACCOUNT.email, password: DEMO_ACCOUNT.password }),
    });
    expect(signIn.status).toBe(200);
    cookie = signIn.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .join('; ');
    const { trips } = (await (await call('/api/trips')).json()) as { trips: { id: string }[] };
    tripId = trips[0]?.id ?? '';
  }, 90_000);
  afterAll(async () => server?.stop());

  it('when a budget is asked for, then its worker thread computes it', async () => {
    const response = await call(`/api/trips/${tripId}/budget`);
    expect(response.status).toBe(200);
    expect(((await response.json()) as { result: object }).result).toHaveProperty('headline');
  });

  it('when a GPX file is previewed, then its worker thread reads it', async () => {
    const response = await call(`/api/trips/${tripId}/gpx/preview`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/gpx+xml' },
      body: fs.readFileSync(GPX_FILE, 'utf8'),
    });
    expect(response.status).toBe(200);
    expect(((await response.json()) as { stops: unknown[] }).stops).toHaveLength(4);
  });

  it('when sign-up chooses a common password, then the password worker refuses it', async () => {
    const response = await call('/api/auth/sign-up/email', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ name: 'Ailsa', email: 'ailsa@example.test', password: 'password1' }),
    });
    expect(response.status).toBe(400);
    expect(await response.json()).toMatchObject({
      code: 'PASSWORD_TOO_WEAK',
      fields: { password: [PASSWORD_MESSAGES.common] },
    });
  });

  it("when the server is compiled, then zxcvbn's word lists are left to the password worker", () => {
    const server = fs.readFileSync(SERVER_BUNDLE, 'utf8');
    expect(server).toContain('password-worker.cjs');
    expect(server).not.toMatch(/require\("@zxcvbn-ts/);
  });
});
