import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { haurwitzGhi } from '@/shared/engine/clear-sky';
import { sunPosition } from '@/shared/engine/sun-position';
import { PUBLIC_ARCHIVE_URL, weatherEndpoints } from '@/server/weather/endpoints';
import { startLocalWeather, type LocalWeather } from '@/server/weather/local-weather';
import { meanClearness, syntheticSite, yearClearness } from '@/server/weather/synthetic-weather';
import { fetchHourlyWeather, WeatherFetchError } from '@/server/weather/weather-client';

const TODAY = new Date('2026-11-20T10:00:00Z');

describe('the synthetic weather model', () => {
  // Places in each latitude band, both hemispheres: equatorial, subtropical, mid-latitude, subpolar.
  const places = [
    { lat: 4.3, lon: 18.6 },
    { lat: 25.1, lon: -110.3 },
    { lat: -33.9, lon: 151.2 },
    { lat: 47.6, lon: -122.3 },
    { lat: 63.8, lon: -20.9 },
  ];

  it('when 10,000 days are drawn per latitude band and month, then their mean clearness is within 2 % of the model', () => {
    for (const place of places) {
      const site = syntheticSite(place.lat, place.lon);
      const sums = Array.from({ length: 12 }, () => ({ drawn: 0, model: 0, days: 0 }));
      // 340 years of one place: about 10,300 days in each calendar month.
      for (let year = 1700; year < 2040; year++) {
        const days = yearClearness(site, year);
        for (let d = 0; d < days.length; d++) {
          const month = new Date(Date.UTC(year, 0, d + 1)).getUTCMonth();
          const cell = sums[month];
          if (!cell) throw new Error(`no month ${month}`);
          cell.drawn += days[d] ?? Number.NaN;
          cell.model += meanClearness(site.lat, d + 1, site.clearnessOffset);
          cell.days += 1;
        }
      }
      for (const cell of sums) {
        expect(cell.days).toBeGreaterThan(9400);
        const drawn = cell.drawn / cell.days;
        const model = cell.model / cell.days;
        expect(Math.abs(drawn - model) / model).toBeLessThan(0.02);
      }
    }
  });

  it('when the season turns, then a mid-latitude place is clearer in its summer than its winter, in both hemispheres', () => {
    expect(meanClearness(47, 196)).toBeGreaterThan(meanClearness(47, 15) + 0.1);
    expect(meanClearness(-47, 15)).toBeGreaterThan(meanClearness(-47, 196) + 0.1);
  });

  it('when two places differ only past the 0.1° grid, then they share a site; across a cell they usually differ', () => {
    expect(syntheticSite(47.61, -122.33)).toEqual(syntheticSite(47.64, -122.26));
    expect(syntheticSite(47.6, -122.3).seed).not.toBe(syntheticSite(47.7, -122.3).seed);
  });
});

describe('the local weather fake over HTTP', () => {
  let fake: LocalWeather;
  beforeAll(async () => {
    fake = await startLocalWeather(0, () => TODAY);
  });
  afterAll(() => fake.close());

  const july = { lat: 44.43, lon: -110.59, startDate: '2019-07-01', endDate: '2019-07-10' };

  it('when the same request is made twice, then it gets the same answer', async () => {
    const first = await fetchHourlyWeather(fake.archiveUrl, july);
    const second = await fetchHourlyWeather(fake.archiveUrl, july);
    expect(second).toEqual(first);
    expect(first.timeMs).toHaveLength(240);
  });

  it('when a shorter range is asked for, then its days match the longer answer hour for hour', async () => {
    const whole = await fetchHourlyWeather(fake.archiveUrl, july);
    const part = await fetchHourlyWeather(fake.archiveUrl, { ...july, startDate: '2019-07-04', endDate: '2019-07-05' });
    const from = whole.timeMs.indexOf(part.timeMs[0] ?? -1);
    expect(from).toBe(72);
    expect(whole.ghiWm2.slice(from, from + 48)).toEqual(part.ghiWm2);
  });

  it("when hours are read back, then each day's GHI is one clearness times the clear-sky curve, zero at night", async () => {
    const got = await fetchHourlyWeather(fake.archiveUrl, { ...july, endDate: '2019-07-01' });
    const ratios: number[] = [];
    got.timeMs.forEach((t, i) => {
      let clear = 0;
      for (let q = 0; q < 4; q++)
        clear +=
          haurwitzGhi(90 - sunPosition(t - 3_600_000 + (q + 0.5) * 900_000, got.latitude, got.longitude).altitudeDeg) /
          4;
      if (clear === 0) expect(got.ghiWm2[i]).toBe(0);
      else if (clear > 200) ratios.push((got.ghiWm2[i] ?? 0) / clear);
    });
    expect(ratios.length).toBeGreaterThan(6);
    const [first] = ratios;
    for (const r of ratios) expect(r).toBeCloseTo(first ?? Number.NaN, 2);
    const temps = got.tempC.filter((t): t is number => t !== null);
    expect(Math.max(...temps) - Math.min(...temps)).toBeGreaterThan(3);
  });

  it('when the archive is asked for dates after today, then it refuses, and the forecast answers them', async () => {
    const ahead = { ...july, startDate: '2026-11-25', endDate: '2026-11-26' };
    await expect(fetchHourlyWeather(fake.archiveUrl, ahead)).rejects.toMatchObject({ kind: 'refused' });
    const forecast = await fetchHourlyWeather(fake.forecastUrl, ahead);
    expect(forecast.timeMs).toHaveLength(48);
  });
});

describe('the weather client against a broken service', () => {
  let server: http.Server;
  let base = '';
  beforeAll(async () => {
    server = http.createServer((req, res) => {
      if (req.url?.startsWith('/garbage')) return res.end('<html>not json</html>');
      if (req.url?.startsWith('/shape')) return res.end(JSON.stringify({ hourly: { time: [1, 2] } }));
      if (req.url?.startsWith('/huge')) {
        res.write('[');
        for (let i = 0; i < 300; i++) res.write('0,'.repeat(5000));
        return res.end('0]');
      }
      if (req.url?.startsWith('/slow')) return void setTimeout(() => res.end('{}'), 2000);
      res.statusCode = 503;
      res.end('busy');
    });
    await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
    base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  });
  afterAll(() => {
    server.closeAllConnections();
    server.close();
  });
  const request = { lat: 10, lon: 10, startDate: '2020-01-01', endDate: '2020-01-02' };

  it.each([
    ['garbage', 'not JSON'],
    ['shape', 'unexpected shape'],
    ['huge', 'bytes'],
    ['busy', '503'],
  ])('when it answers %s, then the fetch fails with a reason and may be retried', async (path, reason) => {
    const failure = await fetchHourlyWeather(`${base}/${path}`, request).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(WeatherFetchError);
    expect(failure).toMatchObject({ kind: 'failed' });
    expect((failure as Error).message).toContain(reason);
  });

  it('when it is slower than the time limit, then the fetch fails as timed out', async () => {
    await expect(fetchHourlyWeather(`${base}/slow`, request, { timeoutMs: 200 })).rejects.toThrow('in time');
  });

  it('when nothing listens, then the fetch fails as unreachable', async () => {
    await expect(fetchHourlyWeather('http://127.0.0.1:9/v1/archive', request)).rejects.toThrow('reached');
  });
});

describe('weather endpoints', () => {
  const fake = { archiveUrl: 'http://127.0.0.1:1/v1/archive', forecastUrl: 'http://127.0.0.1:1/v1/forecast' };
  it('when nothing is set in production, then the public services are used', () => {
    expect(weatherEndpoints({}, true, undefined).archiveUrl).toBe(PUBLIC_ARCHIVE_URL);
  });
  it('when nothing is set outside production, then the local fake is used', () => {
    expect(weatherEndpoints({}, false, fake)).toEqual(fake);
  });
  it('when set to off, then that kind is not fetched', () => {
    expect(weatherEndpoints({ WEATHER_API_URL: 'off', WEATHER_FORECAST_URL: 'off' }, true, fake)).toEqual({
      archiveUrl: null,
      forecastUrl: null,
    });
  });
});
