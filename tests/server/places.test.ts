import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorHandler } from '@/server/middleware/error-handler';
import { warmBasemap } from '@/server/places/basemap';
import { warmGazetteer } from '@/server/places/gazetteer';
import { placesRouter } from '@/server/routes/places';
import { greatCircleKm } from '@/shared/geo/great-circle';
import type { Basemap, NearbyPlacesResponse, PlaceSearchResponse } from '@/shared/schemas/places';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';

let ctx: TestContext;
let agent: Awaited<ReturnType<typeof signUpAgent>>['agent'];

beforeAll(async () => {
  warmGazetteer();
  warmBasemap();
  ctx = createTestApp();
  agent = (await signUpAgent(ctx.app)).agent;
}, 60_000);
afterAll(() => ctx.close());

const search = async (q: string, extra = '') => {
  const response = await agent.get(`/api/places?q=${encodeURIComponent(q)}${extra}`);
  expect(response.status).toBe(200);
  return response.body as PlaceSearchResponse;
};

describe('GET /api/places', () => {
  it('when a name is typed in part, then the town comes back with its region, country and time zone', async () => {
    const body = await search('fort wil');
    expect(body.query.kind).toBe('name');
    expect(body.places[0]).toMatchObject({
      name: 'Fort William',
      region: 'Scotland',
      country: 'United Kingdom',
      countryCode: 'GB',
      timeZone: 'Europe/London',
    });
    expect(body.places[0]?.lat).toBeCloseTo(56.816, 2);
  });

  it('when a later word of a name is typed, then the name is found by it', async () => {
    const body = await search('william, scotland');
    expect(body.places.map((p) => p.name)).toContain('Fort William');
    // …but after the names that start with it.
    const anywhere = await search('william', '&limit=20');
    expect(anywhere.places[0]?.name.startsWith('William')).toBe(true);
  });

  it('when accents are left out or the case differs, then the accented name is still found', async () => {
    expect((await search('tromso')).places[0]?.name).toBe('Tromsø');
    expect((await search('SAO PAULO')).places[0]?.name).toBe('São Paulo');
    expect((await search('zurich')).places[0]?.name).toBe('Zürich');
  });

  it('when several places share a name, then the larger ones come first', async () => {
    const body = await search('inverness');
    expect(body.places[0]?.region).toBe('Scotland');
    const populations = body.places.filter((p) => p.name === 'Inverness').map((p) => p.population);
    expect(populations).toEqual([...populations].sort((a, b) => b - a));
    expect(populations.length).toBeGreaterThan(2);
  });

  it('when the whole name is typed, then it comes before bigger places that only start with it', async () => {
    const body = await search('oban');
    expect(body.places[0]).toMatchObject({ name: 'Oban', region: 'Scotland' });
  });

  it('when a region or country follows a comma, then only places there are given', async () => {
    const body = await search('Portland, OR');
    expect(body.places.length).toBeGreaterThan(0);
    expect(body.places.every((p) => p.region === 'Oregon')).toBe(true);
    const scottish = await search('inverness scotland');
    expect(scottish.places.map((p) => p.region)).toEqual(['Scotland']);
  });

  it('when coordinates are typed, then the answer is that point and the towns nearest to it', async () => {
    const body = await search("57°07'N 5°20'W");
    expect(body.query).toMatchObject({ kind: 'coordinates', timeZone: 'Europe/London' });
    if (body.query.kind !== 'coordinates') throw new Error('expected coordinates');
    expect(body.query.lat).toBeCloseTo(57 + 7 / 60, 6);
    const distances = body.places.map((p) => p.distanceKm ?? Infinity);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
    // A remote glen: the nearest town is some way off, but not far.
    expect(distances[0]).toBeLessThan(60);
  });

  it('when nothing matches, then the list is empty rather than an error', async () => {
    expect((await search('qqqqzzzz')).places).toEqual([]);
  });

  it.each([
    ['no search at all', ''],
    ['an empty search', '?q=%20%20'],
    ['a search past 80 characters', `?q=${'a'.repeat(81)}`],
    ['two searches at once', '?q=a&q=b'],
    ['a limit past 20', '?q=oban&limit=50'],
    ['an unknown parameter', '?q=oban&sort=name'],
  ])('when given %s, then it answers 400 with the error shape', async (_what, query) => {
    const response = await agent.get(`/api/places${query}`);
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('validation_failed');
  });

  it('when signed out, then it answers 401', async () => {
    const response = await request(ctx.app).get('/api/places?q=oban');
    expect(response.status).toBe(401);
  });
});

describe('GET /api/places/near', () => {
  it('when a pitch is not a town, then the nearest towns come back nearest first with true distances', async () => {
    const point = { lat: 57.16, lon: -4.79 };
    const response = await agent.get(`/api/places/near?lat=${point.lat}&lon=${point.lon}&limit=5`);
    expect(response.status).toBe(200);
    const { places } = response.body as NearbyPlacesResponse;
    expect(places).toHaveLength(5);
    for (const place of places) expect(place.distanceKm).toBeCloseTo(greatCircleKm(point, place), 1);
    const distances = places.map((p) => p.distanceKm ?? 0);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
  });

  it('when a point is near the date line, then towns across it are found', async () => {
    const response = await agent.get('/api/places/near?lat=-17.8&lon=179.99&limit=3');
    const { places } = response.body as NearbyPlacesResponse;
    expect(places.some((p) => p.lon < 0 || p.lon > 177)).toBe(true);
    expect(places[0]?.distanceKm ?? Infinity).toBeLessThan(300);
  });

  it('when the latitude is past the pole, then it answers 400', async () => {
    const response = await agent.get('/api/places/near?lat=95&lon=0');
    expect(response.status).toBe(400);
  });
});

describe('GET /api/places/basemap', () => {
  it('when asked for the Highlands, then land comes back cut to that box at the finest scale', async () => {
    const response = await agent.get('/api/places/basemap?west=-6.5&south=56.5&east=-4&north=58');
    expect(response.status).toBe(200);
    const map = response.body as Basemap;
    expect(map.detail).toBe('10m');
    expect(map.land.length).toBeGreaterThan(0);
    const points = map.land.flat();
    for (const [lon, lat] of points) {
      expect(lon).toBeGreaterThanOrEqual(-6.5);
      expect(lon).toBeLessThanOrEqual(-4);
      expect(lat).toBeGreaterThanOrEqual(56.5);
      expect(lat).toBeLessThanOrEqual(58);
    }
    for (const ring of map.land) expect(ring[0]).toEqual(ring[ring.length - 1]);
  });

  it('when asked for a continent, then the coarse scale with borders is used', async () => {
    const response = await agent.get('/api/places/basemap?west=-130&south=20&east=-60&north=55');
    const map = response.body as Basemap;
    expect(map.detail).toBe('110m');
    expect(map.borders.length).toBeGreaterThan(0);
  });

  it('when north is below south, then it is refused with the error shape', async () => {
    const response = await agent.get('/api/places/basemap?west=-6&south=58&east=-4&north=56');
    expect(response.status).toBe(422);
    expect(response.body.error.fields.north).toBeDefined();
  });
});

describe('place search rate limit', () => {
  it('when one person searches too often, then further searches get 429 with the error shape', async () => {
    const app = express();
    app.use((_req, res, next) => {
      res.locals.user = { id: 'u1', email: 'u1@example.test', name: 'U' };
      next();
    });
    app.use('/api/places', placesRouter({ perMinute: 2 }));
    app.use(errorHandler);
    await request(app).get('/api/places?q=oban').expect(200);
    await request(app).get('/api/places?q=oban').expect(200);
    const third = await request(app).get('/api/places?q=oban');
    expect(third.status).toBe(429);
    expect(third.body.error.code).toBe('rate_limited');
  });
});
