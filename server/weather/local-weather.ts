import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { weatherQuerySchema, WEATHER_VARIABLES, type WeatherQuery } from '@/shared/schemas/weather';
import { syntheticHourly, syntheticSite } from './synthetic-weather';

export type LocalWeather = {
  /** The historical archive's address (answers GET with the archive's query). */
  archiveUrl: string;
  /** The forecast's address (same query and answer, dates near today only). */
  forecastUrl: string;
  /** Requests answered so far, for tests that check reuse of the cache. */
  requestCount: () => number;
  close: () => Promise<void>;
};

const DAY_MS = 86_400_000;
/** The archive lags real time by a few days; the forecast reaches about 16 days ahead and 3 months back. */
const ARCHIVE_LAG_DAYS = 2;
const FORECAST_PAST_DAYS = 92;
const FORECAST_DAYS = 16;

const dateOf = (ms: number) => new Date(ms).toISOString().slice(0, 10);

function answer(res: http.ServerResponse, status: number, body: unknown): void {
  const text = JSON.stringify(body);
  res.writeHead(status, {
    'content-type': 'application/json; charset=utf-8',
    'content-length': Buffer.byteLength(text),
  });
  res.end(text);
}

function refuse(res: http.ServerResponse, reason: string): void {
  answer(res, 400, { error: true, reason });
}

/** The dates each service serves, as of today. */
function servedRange(kind: 'archive' | 'forecast', nowMs: number): { first: string; last: string } {
  if (kind === 'archive') return { first: '1940-01-01', last: dateOf(nowMs - ARCHIVE_LAG_DAYS * DAY_MS) };
  return { first: dateOf(nowMs - FORECAST_PAST_DAYS * DAY_MS), last: dateOf(nowMs + FORECAST_DAYS * DAY_MS) };
}

function body(query: WeatherQuery, startedMs: number) {
  const site = syntheticSite(query.latitude, query.longitude);
  const series = syntheticHourly(site, query.start_date, query.end_date);
  const hourly: Record<string, unknown> = { time: series.time };
  const units: Record<string, string> = { time: 'iso8601' };
  for (const variable of WEATHER_VARIABLES) {
    if (!query.hourly.includes(variable)) continue;
    hourly[variable] = variable === 'shortwave_radiation' ? series.ghi : series.tempC;
    units[variable] = variable === 'shortwave_radiation' ? 'W/m²' : '°C';
  }
  return {
    latitude: site.lat,
    longitude: site.lon,
    generationtime_ms: Date.now() - startedMs,
    utc_offset_seconds: 0,
    timezone: 'GMT',
    timezone_abbreviation: 'GMT',
    elevation: 0,
    hourly_units: units,
    hourly,
  };
}

/**
 * A real HTTP server on loopback that answers the historical archive's and the forecast's hourly queries with
 * deterministic synthetic weather (see synthetic-weather.ts). The app fetches from it exactly as it would from the
 * public services, so development and tests exercise the whole path without the network. `now` sets "today" for
 * the dates each service serves.
 */
export async function startLocalWeather(port = 0, now: () => Date = () => new Date()): Promise<LocalWeather> {
  let requests = 0;
  const server = http.createServer((req, res) => {
    requests += 1;
    const url = new URL(req.url ?? '/', 'http://127.0.0.1');
    const kind = url.pathname === '/v1/archive' ? 'archive' : url.pathname === '/v1/forecast' ? 'forecast' : null;
    if (req.method !== 'GET' || !kind) return answer(res, 404, { error: true, reason: 'Not found' });
    const started = Date.now();
    const parsed = weatherQuerySchema.safeParse(Object.fromEntries(url.searchParams));
    if (!parsed.success) return refuse(res, parsed.error.issues.map((i) => i.message).join('; '));
    const range = servedRange(kind, now().getTime());
    if (parsed.data.start_date < range.first || parsed.data.end_date > range.last)
      return refuse(
        res,
        `Parameter 'start_date' and 'end_date' are out of allowed range from ${range.first} to ${range.last}`,
      );
    answer(res, 200, body(parsed.data, started));
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.address() as AddressInfo;
  const base = `http://127.0.0.1:${address.port}`;
  return {
    archiveUrl: `${base}/v1/archive`,
    forecastUrl: `${base}/v1/forecast`,
    requestCount: () => requests,
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}
