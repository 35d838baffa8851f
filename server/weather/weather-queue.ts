import type { Db } from '@/db/client';
import {
  bumpTripsAt,
  earliestQueuedAt,
  keyText,
  nextDueSeries,
  queueSeries,
  recordFailedAttempt,
  seriesStates,
  storeSeries,
  type SeriesKey,
} from '@/db/queries/weather-series';
import type { WeatherSeriesRow } from '@/db/schema';
import type { StopWeatherStatus } from '@/shared/schemas/weather';
import { daysIn, stopWeatherRanges, type StopPlaceAndTime } from '@/shared/weather-ranges';
import type { WeatherEndpoints } from './endpoints';
import { fetchHourlyWeather, WeatherFetchError, type HourlyWeather, type WeatherRequest } from './weather-client';

export type WeatherQueueOptions = {
  db: Db;
  endpoints: WeatherEndpoints;
  /** Past years fetched per stop. */
  years: number;
  /** Today's date, for which years the archive holds and which days the forecast covers. */
  today: () => Date;
  /** Requests started per second toward the services, from this process. */
  requestsPerSecond?: number;
  /** Requests in flight at once. */
  concurrency?: number;
  timeoutMs?: number;
  /** Attempts before a series is given up until `restAfterGiveUpMs` has passed. */
  maxAttempts?: number;
  /** First retry's wait; each later one doubles, up to `maxBackoffMs`. */
  backoffMs?: number;
  maxBackoffMs?: number;
  restAfterGiveUpMs?: number;
  /** A forecast older than this is fetched again when a stop asks for it. */
  forecastMaxAgeMs?: number;
  onError?: (error: unknown) => void;
};

export type WeatherQueue = {
  /** Queues the weather the stops need (what is held already is reused) and starts fetching in the background. */
  want: (stops: (StopPlaceAndTime & { id: string })[]) => void;
  /** Where each stop's weather stands; queues what is missing, so stops saved before now catch up. */
  statusFor: (stops: (StopPlaceAndTime & { id: string })[]) => StopWeatherStatus[];
  /** Resolves once nothing is due or in flight (tests). */
  idle: () => Promise<void>;
  close: () => void;
};

const DEFAULTS = {
  requestsPerSecond: 4,
  concurrency: 2,
  timeoutMs: 15_000,
  maxAttempts: 4,
  backoffMs: 2_000,
  maxBackoffMs: 5 * 60_000,
  restAfterGiveUpMs: 6 * 3_600_000,
  forecastMaxAgeMs: 6 * 3_600_000,
};

/** A wait longer than this is not scheduled as a timer: the next want() or status call wakes the queue. */
const LONGEST_TIMER_MS = 10 * 60_000;

function keysFor(stop: StopPlaceAndTime, today: Date, years: number, endpoints: WeatherEndpoints) {
  const ranges = stopWeatherRanges(stop, today, years);
  const record: SeriesKey[] = endpoints.archiveUrl
    ? ranges.record.map((r) => ({ ...ranges.place, startDate: r.startDate, endDate: r.endDate, source: 'record' }))
    : [];
  const forecast: SeriesKey | null =
    endpoints.forecastUrl && ranges.forecast ? { ...ranges.place, ...ranges.forecast, source: 'forecast' } : null;
  return { record, forecast };
}

/**
 * The background fetcher: series rows in SQLite are its queue, so what is queued survives a restart. Fetches run
 * with a per-process rate limit, a few at a time, each with a time limit; a failure is retried with doubling waits,
 * then given up for a few hours; a refusal (the service says the query cannot be answered) is not retried.
 */
export function createWeatherQueue(options: WeatherQueueOptions): WeatherQueue {
  const o = { ...DEFAULTS, ...options };
  const { db } = o;
  const spacingMs = 1000 / o.requestsPerSecond;
  const inFlight = new Map<number, Promise<void>>();
  let lastStartMs = -Infinity;
  let timer: NodeJS.Timeout | undefined;
  let closed = false;
  const enabled = o.endpoints.archiveUrl !== null || o.endpoints.forecastUrl !== null;

  const fetchOne = async (row: WeatherSeriesRow): Promise<void> => {
    const endpoint = row.source === 'record' ? o.endpoints.archiveUrl : o.endpoints.forecastUrl;
    const request: WeatherRequest = {
      lat: row.latE1 / 10,
      lon: row.lonE1 / 10,
      startDate: row.startDate,
      endDate: row.endDate,
    };
    try {
      if (!endpoint) throw new WeatherFetchError('refused', 'Fetching this kind of weather is turned off.');
      const got = await fetchHourlyWeather(endpoint, request, { timeoutMs: o.timeoutMs });
      checkCoverage(got, row);
      if (closed) return;
      // The series and the budgets it changes, at once: every trip with a stop at that place computes again.
      db.transaction((tx) => {
        storeSeries(tx, row.id, { ghiWm2: got.ghiWm2, tempC: got.tempC }, new Date());
        bumpTripsAt(tx, row);
      });
    } catch (error) {
      if (closed) return;
      const refused = error instanceof WeatherFetchError && error.kind === 'refused';
      const giveUp = refused || row.attempts + 1 >= o.maxAttempts;
      const wait = giveUp ? o.restAfterGiveUpMs : Math.min(o.maxBackoffMs, o.backoffMs * 2 ** row.attempts);
      recordFailedAttempt(db, row.id, {
        giveUp,
        retryAt: new Date(Date.now() + wait),
        error: error instanceof Error ? error.message : String(error),
      });
    }
  };

  const pump = (): void => {
    if (closed || !enabled) return;
    if (timer) {
      clearTimeout(timer);
      timer = undefined;
    }
    try {
      while (inFlight.size < o.concurrency) {
        const nowMs = Date.now();
        const waitForRate = lastStartMs + spacingMs - nowMs;
        if (waitForRate > 0) {
          timer = setTimeout(pump, waitForRate);
          return;
        }
        const row = nextDueSeries(db, new Date(nowMs), [...inFlight.keys()]);
        if (!row) break;
        lastStartMs = nowMs;
        const job = fetchOne(row)
          .catch((error: unknown) => o.onError?.(error))
          .finally(() => {
            inFlight.delete(row.id);
            pump();
          });
        inFlight.set(row.id, job);
      }
      if (inFlight.size > 0) return;
      const next = earliestQueuedAt(db);
      if (next) {
        const wait = Math.max(0, next.getTime() - Date.now());
        if (wait <= LONGEST_TIMER_MS) timer = setTimeout(pump, wait);
      }
    } catch (error) {
      // The database closed under a pending timer (shutdown): nothing more to do.
      o.onError?.(error);
    }
  };

  const want = (stops: (StopPlaceAndTime & { id: string })[]): void => {
    if (closed || !enabled) return;
    const today = o.today();
    const keys = stops.flatMap((s) => {
      const k = keysFor(s, today, o.years, o.endpoints);
      return k.forecast ? [...k.record, k.forecast] : k.record;
    });
    // Queuing is a side errand of saving a stop: a failure here is logged, never the save's answer.
    try {
      queueSeries(db, keys, new Date(), o.forecastMaxAgeMs);
    } catch (error) {
      o.onError?.(error);
      return;
    }
    pump();
  };

  const statusFor = (stops: (StopPlaceAndTime & { id: string })[]): StopWeatherStatus[] => {
    want(stops);
    const today = o.today();
    const perStop = stops.map((s) => ({ stop: s, ...keysFor(s, today, o.years, o.endpoints) }));
    const states = new Map(
      seriesStates(
        db,
        perStop.flatMap((p) => (p.forecast ? [...p.record, p.forecast] : p.record)),
      ).map((st) => [keyText(st), st]),
    );
    return perStop.map(({ stop, record, forecast }) => {
      const held = record.map((k) => states.get(keyText(k)));
      const yearsReady = held.filter((st) => st?.hasData).length;
      const pending = held.some((st) => !st || st.status === 'queued');
      const forecastState = forecast ? states.get(keyText(forecast)) : undefined;
      const base = { stopId: stop.id, yearsReady, yearsWanted: record.length };
      const forecastDays = forecast && forecastState?.hasData ? daysIn(forecast) : 0;
      if (!o.endpoints.archiveUrl) return { ...base, state: 'off', forecastDays };
      const state = pending ? 'loading' : yearsReady > 0 ? 'ready' : 'unavailable';
      return { ...base, state, forecastDays };
    });
  };

  const idle = async (): Promise<void> => {
    for (;;) {
      if (closed) return;
      if (inFlight.size > 0) {
        await Promise.all(inFlight.values());
        continue;
      }
      const next = earliestQueuedAt(db);
      if (!next) return;
      await new Promise((resolve) => setTimeout(resolve, Math.max(10, next.getTime() - Date.now())));
      pump();
    }
  };

  return {
    want,
    statusFor,
    idle,
    close: () => {
      closed = true;
      if (timer) clearTimeout(timer);
    },
  };
}

/** An answer must hold exactly the hours asked for, from the first date's midnight. */
function checkCoverage(got: HourlyWeather, row: WeatherSeriesRow): void {
  const first = Date.parse(`${row.startDate}T00:00:00Z`);
  const hours = daysIn(row) * 24;
  if (got.timeMs.length !== hours || got.timeMs[0] !== first || got.timeMs.at(-1) !== first + (hours - 1) * 3_600_000)
    throw new WeatherFetchError('failed', 'The weather service answered for other hours than asked.');
}
