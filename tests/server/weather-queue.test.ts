import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { bumpTripsAt } from '@/db/queries/weather-series';
import { trips } from '@/db/schema';
import type { AppConfig } from '@/server/app';
import { weatherPlace } from '@/shared/weather-ranges';
import { startLocalWeather, type LocalWeather } from '@/server/weather/local-weather';
import type { TripWeather } from '@/shared/schemas/weather';
import { engineWeatherSchema } from '@/shared/schemas/engine-weather';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, stopOnNextFreeDay } from '../factories/trip-factory';

const TODAY = new Date('2026-11-20T10:00:00Z');
/** Short waits and few years, so a failing service is given up on within a test. */
const FAST = { requestsPerSecond: 200, maxAttempts: 2, backoffMs: 20, timeoutMs: 300 };

let ctx: TestContext | undefined;
afterEach(() => {
  ctx?.close();
  ctx = undefined;
});

function appWith(weather: AppConfig['weather']): TestContext {
  ctx = createTestApp({ now: () => TODAY, config: { weather } });
  return ctx;
}

async function weatherOf(agent: Awaited<ReturnType<typeof signUpAgent>>['agent'], tripId: string) {
  const response = await agent.get(`/api/trips/${tripId}/weather`).expect(200);
  return response.body as TripWeather;
}

describe('weather records through the local fake', () => {
  let fake: LocalWeather;
  beforeAll(async () => {
    fake = await startLocalWeather(0, () => TODAY);
  });
  afterAll(() => fake.close());

  it('when a stop is saved, then its record shows loading, then every year ready, and a second trip there reuses it', async () => {
    const { app } = appWith({ archiveUrl: fake.archiveUrl, forecastUrl: fake.forecastUrl, years: 5, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    const placed = stopOnNextFreeDay();
    const stop = await addStop(agent, trip.trip.id, placed);
    const first = await weatherOf(agent, trip.trip.id);
    expect(first.stops).toEqual([expect.objectContaining({ stopId: stop.id, state: 'loading', yearsWanted: 5 })]);
    await app.locals.weather.idle();
    const done = await weatherOf(agent, trip.trip.id);
    expect(done.stops[0]).toMatchObject({ state: 'ready', yearsReady: 5, yearsWanted: 5, forecastDays: 0 });

    const asked = fake.requestCount();
    const other = await createTrip(agent, { name: 'Same glen again' });
    await addStop(agent, other.trip.id, { ...placed, name: 'Same pitch', lat: placed.lat + 0.02 });
    expect((await weatherOf(agent, other.trip.id)).stops[0]).toMatchObject({ state: 'ready', yearsReady: 5 });
    await app.locals.weather.idle();
    expect(fake.requestCount()).toBe(asked);
  });

  it("when a stop's record is in, then its budget runs once per recorded year and says how many held", async () => {
    const { app } = appWith({ archiveUrl: fake.archiveUrl, forecastUrl: fake.forecastUrl, years: 5, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    await addAppliance(agent, trip.trip.id);
    await app.locals.weather.idle();
    const after = await agent.get(`/api/trips/${trip.trip.id}/budget`).expect(200);
    expect(after.body.result.chance).toMatchObject({ years: 5 });
    expect(after.body.result.chance.byYear.map((y: { year: number }) => y.year).sort()).toEqual([
      2022, 2023, 2024, 2025, 2026,
    ]);
    expect(after.body.result.skies).toEqual({ sources: ['record'], assumedStops: 0 });
    expect(after.body.result.socBand.p10).toHaveLength(after.body.result.soc.socPct.length);
  });

  it('when a stop picks its own sky over a record that is in, then its budget plans on that sky and says so', async () => {
    const { app } = appWith({ archiveUrl: fake.archiveUrl, forecastUrl: fake.forecastUrl, years: 3, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    const stop = await addStop(agent, trip.trip.id, {
      ...stopOnNextFreeDay(),
      skySource: 'preset',
      skyOutlook: 'hazy',
    });
    await addAppliance(agent, trip.trip.id);
    await app.locals.weather.idle();
    const detail = await agent.get(`/api/trips/${trip.trip.id}`).expect(200);
    expect(detail.body.stops[0].stop).toMatchObject({ skySource: 'preset', ownTemperatures: false });
    const picked = await agent.get(`/api/trips/${trip.trip.id}/budget`).expect(200);
    expect(picked.body.result.chance).toBeNull();
    expect(picked.body.result.skies).toEqual({ sources: ['preset'], assumedStops: 1 });

    // Back to the record: the same stored years now run.
    await agent
      .patch(`/api/trips/${trip.trip.id}/stops/${stop.id}`)
      .send({ version: stop.version, stop: { ...detail.body.stops[0].stop, skySource: 'record' } })
      .expect(200);
    const recorded = await agent.get(`/api/trips/${trip.trip.id}/budget`).expect(200);
    expect(recorded.body.result.chance).toMatchObject({ years: 3 });
  });

  it("when the browser asks for a trip's recorded years, then it gets the engine's weather for its stops", async () => {
    const { app } = appWith({ archiveUrl: fake.archiveUrl, forecastUrl: fake.forecastUrl, years: 3, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    const empty = await agent.get(`/api/trips/${trip.trip.id}/weather/record`).expect(200);
    expect(empty.body).toEqual({ weather: null });
    await addStop(agent, trip.trip.id);
    await app.locals.weather.idle();
    const held = await agent.get(`/api/trips/${trip.trip.id}/weather/record`).expect(200);
    const weather = engineWeatherSchema.parse(held.body.weather);
    expect(weather.years).toHaveLength(3);
    expect(weather.years[0]?.stops[0]?.ghiWm2.length).toBeGreaterThan(24);
  });

  it('when a stop is inside the forecast horizon, then its forecast days are fetched too', async () => {
    const { app } = appWith({ archiveUrl: fake.archiveUrl, forecastUrl: fake.forecastUrl, years: 2, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent, { startDate: '2026-11-21', endDate: '2026-11-30' });
    await addStop(agent, trip.trip.id, {
      ...stopOnNextFreeDay(),
      arriveAt: '2026-11-22T14:00Z',
      departAt: '2026-11-24T10:00Z',
    });
    await weatherOf(agent, trip.trip.id);
    await app.locals.weather.idle();
    expect((await weatherOf(agent, trip.trip.id)).stops[0]).toMatchObject({
      state: 'ready',
      yearsReady: 2,
      forecastDays: 3,
    });
  });

  it('when weather is turned off, then every stop says so and nothing is fetched', async () => {
    const { app } = appWith({ archiveUrl: null, forecastUrl: null });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    const asked = fake.requestCount();
    expect((await weatherOf(agent, trip.trip.id)).stops[0]).toMatchObject({ state: 'off', yearsReady: 0 });
    await app.locals.weather.idle();
    expect(fake.requestCount()).toBe(asked);
  });
});

describe('weather records from a broken service', () => {
  let server: http.Server;
  let base = '';
  const starts: { path: string; at: number }[] = [];
  const failedOnce = new Set<string>();
  let fake: LocalWeather;
  beforeAll(async () => {
    fake = await startLocalWeather(0, () => TODAY);
    server = http.createServer((req, res) => {
      const path = (req.url ?? '').split('?')[0] ?? '';
      starts.push({ path, at: Date.now() });
      if (path === '/garbage') return res.end('{"hourly": "nonsense"}');
      if (path === '/slow') return void setTimeout(() => res.end('{}'), 2000);
      if (path === '/flaky') {
        // Each query fails the first time it is asked, then is passed on to the fake.
        const query = (req.url ?? '').split('?')[1] ?? '';
        if (!failedOnce.has(query)) {
          failedOnce.add(query);
          res.statusCode = 503;
          return res.end('busy');
        }
        return void fetch(`${fake.archiveUrl}?${query}`)
          .then((r) => r.text())
          .then((text) => res.end(text));
      }
      res.statusCode = 500;
      res.end('boom');
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    server.closeAllConnections();
    server.close();
    await fake.close();
  });

  it.each([
    ['down', 'http://127.0.0.1:9/v1/archive'],
    ['slow', '/slow'],
    ['answering garbage', '/garbage'],
    ['failing', '/boom'],
  ])('when the service is %s, then the stop says unavailable and the budget still computes', async (_what, url) => {
    const archiveUrl = url.startsWith('/') ? `${base}${url}` : url;
    const { app } = appWith({ archiveUrl, forecastUrl: null, years: 2, queue: FAST });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    await addAppliance(agent, trip.trip.id);
    await app.locals.weather.idle();
    expect((await weatherOf(agent, trip.trip.id)).stops[0]).toMatchObject({ state: 'unavailable', yearsReady: 0 });
    const budget = await agent.get(`/api/trips/${trip.trip.id}/budget`);
    expect(budget.status).toBe(200);
    expect(budget.body.result.chance).toBeNull();
    expect(budget.body.result.skies).toEqual({ sources: ['preset'], assumedStops: 1 });
  });

  it('when a fetch fails once, then it is retried after a wait and the record completes', async () => {
    starts.length = 0;
    const { app } = appWith({
      archiveUrl: `${base}/flaky`,
      forecastUrl: null,
      years: 2,
      queue: { ...FAST, backoffMs: 150, concurrency: 1 },
    });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    await app.locals.weather.idle();
    expect((await weatherOf(agent, trip.trip.id)).stops[0]).toMatchObject({ state: 'ready', yearsReady: 2 });
    expect(starts.length).toBe(4);
    // The retry of each query waited out its back-off.
    const [firstTry, , retry] = starts;
    expect((retry?.at ?? 0) - (firstTry?.at ?? 0)).toBeGreaterThanOrEqual(140);
  });

  it('when many series are queued, then requests start no faster than the rate limit', async () => {
    starts.length = 0;
    const { app } = appWith({
      archiveUrl: `${base}/boom`,
      forecastUrl: null,
      years: 6,
      queue: { ...FAST, requestsPerSecond: 10, maxAttempts: 1, concurrency: 4 },
    });
    const { agent } = await signUpAgent(app);
    const trip = await createTrip(agent);
    await addStop(agent, trip.trip.id);
    await app.locals.weather.idle();
    expect(starts.length).toBe(6);
    // 10 a second: the k-th request starts at least k × 100 ms after the first, less arrival jitter on a busy machine
    // (the first request's arrival can be late by tens of ms when two test files share the cores). Without the limit
    // all six arrive within a few ms of each other, so this still fails from the second request on.
    const first = starts[0]?.at ?? 0;
    starts.forEach((s, k) => expect(s.at - first).toBeGreaterThanOrEqual(k * 100 - 60));
  });

  it("when a place's weather arrives, then the budgets of trips stopping there, and only those, are computed again", async () => {
    const { app, db } = appWith({ archiveUrl: null, forecastUrl: null });
    const { agent } = await signUpAgent(app);
    const here = await createTrip(agent);
    const elsewhere = await createTrip(agent, { name: 'Elsewhere' });
    const stop = stopOnNextFreeDay();
    await addStop(agent, here.trip.id, stop);
    await addStop(agent, elsewhere.trip.id, { ...stop, lat: stop.lat + 1 });
    const revision = (id: string) => db.select().from(trips).where(eq(trips.id, id)).get()?.revision ?? 0;
    const [hereBefore, elsewhereBefore] = [revision(here.trip.id), revision(elsewhere.trip.id)];
    bumpTripsAt(db, weatherPlace(stop.lat + 0.03, stop.lon));
    expect(revision(here.trip.id)).toBe(hereBefore + 1);
    expect(revision(elsewhere.trip.id)).toBe(elsewhereBefore);
  });

  it('when the weather route is asked for a trip one cannot see, then it answers 404 with the stable error', async () => {
    const { app } = appWith({ archiveUrl: null, forecastUrl: null });
    const owner = await signUpAgent(app);
    const stranger = await signUpAgent(app);
    const trip = await createTrip(owner.agent);
    const response = await stranger.agent.get(`/api/trips/${trip.trip.id}/weather`).expect(404);
    expect(response.body.error.code).toBe('not_found');
  });
});
