import { and, asc, eq, gte, inArray, lte, notInArray, or, sql } from 'drizzle-orm';
import { MAX_RECORD_YEARS, type EngineWeather, type HourlySky } from '@/shared/schemas/engine-weather';
import { shiftDate, stopDates, weatherPlace, type StopPlaceAndTime } from '@/shared/weather-ranges';
import type { DbExecutor } from '../client';
import { stops, trips, weatherSeries, type WeatherSeriesRow } from '../schema';

export type SeriesKey = {
  latE1: number;
  lonE1: number;
  startDate: string;
  endDate: string;
  source: 'record' | 'forecast';
};

const keyMatch = (k: SeriesKey) =>
  and(
    eq(weatherSeries.latE1, k.latE1),
    eq(weatherSeries.lonE1, k.lonE1),
    eq(weatherSeries.startDate, k.startDate),
    eq(weatherSeries.endDate, k.endDate),
    eq(weatherSeries.source, k.source),
  );

/**
 * Queues every key not yet held, and queues again what has gone stale: a forecast fetched longer ago than
 * `forecastMaxAgeMs` (its data kept until the new one arrives), and a failed series whose rest has passed.
 * One transaction.
 */
export function queueSeries(db: DbExecutor, keys: SeriesKey[], at: Date, forecastMaxAgeMs: number): void {
  if (keys.length === 0) return;
  db.transaction((tx) => {
    tx.insert(weatherSeries)
      .values(keys.map((k) => ({ ...k, status: 'queued' as const, nextAttemptAt: at })))
      .onConflictDoNothing()
      .run();
    const staleForecast = new Date(at.getTime() - forecastMaxAgeMs);
    for (const k of keys) {
      tx.update(weatherSeries)
        .set({ status: 'queued', attempts: 0, nextAttemptAt: at })
        .where(
          and(
            keyMatch(k),
            or(
              and(eq(weatherSeries.status, 'failed'), lte(weatherSeries.nextAttemptAt, at)),
              and(
                eq(weatherSeries.source, 'forecast'),
                eq(weatherSeries.status, 'ready'),
                lte(weatherSeries.fetchedAt, staleForecast),
              ),
            ),
          ),
        )
        .run();
    }
  });
}

/** Where each key stands, without its hourly data. */
export type SeriesState = SeriesKey & { status: WeatherSeriesRow['status']; hasData: boolean };

export function seriesStates(db: DbExecutor, keys: SeriesKey[]): SeriesState[] {
  if (keys.length === 0) return [];
  const places = [...new Set(keys.map((k) => k.latE1))];
  const rows = db
    .select({
      latE1: weatherSeries.latE1,
      lonE1: weatherSeries.lonE1,
      startDate: weatherSeries.startDate,
      endDate: weatherSeries.endDate,
      source: weatherSeries.source,
      status: weatherSeries.status,
      hasData: sql<number>`${weatherSeries.ghiWm2} is not null`,
    })
    .from(weatherSeries)
    .where(inArray(weatherSeries.latE1, places))
    .all();
  const wanted = new Set(keys.map(keyText));
  return rows.filter((r) => wanted.has(keyText(r))).map((r) => ({ ...r, hasData: Boolean(r.hasData) }));
}

export const keyText = (k: SeriesKey) => `${k.latE1},${k.lonE1},${k.startDate},${k.endDate},${k.source}`;

/** The next queued series whose time has come, leaving out those already being fetched. */
export function nextDueSeries(db: DbExecutor, at: Date, busyIds: number[]): WeatherSeriesRow | undefined {
  return db
    .select()
    .from(weatherSeries)
    .where(
      and(
        eq(weatherSeries.status, 'queued'),
        lte(weatherSeries.nextAttemptAt, at),
        busyIds.length > 0 ? notInArray(weatherSeries.id, busyIds) : undefined,
      ),
    )
    .orderBy(asc(weatherSeries.nextAttemptAt), asc(weatherSeries.id))
    .limit(1)
    .get();
}

/** When the earliest queued series may next be tried, if any is queued. */
export function earliestQueuedAt(db: DbExecutor): Date | undefined {
  return db
    .select({ at: weatherSeries.nextAttemptAt })
    .from(weatherSeries)
    .where(eq(weatherSeries.status, 'queued'))
    .orderBy(asc(weatherSeries.nextAttemptAt))
    .limit(1)
    .get()?.at;
}

export function storeSeries(
  db: DbExecutor,
  id: number,
  data: { ghiWm2: (number | null)[]; tempC: (number | null)[] },
  at: Date,
): void {
  db.update(weatherSeries)
    .set({ status: 'ready', ...data, fetchedAt: at, lastError: null, attempts: 0 })
    .where(eq(weatherSeries.id, id))
    .run();
}

/** After a failed attempt: queued again at `retryAt`, or given up (`failed`) until `retryAt` when no retry is left. */
export function recordFailedAttempt(
  db: DbExecutor,
  id: number,
  outcome: { giveUp: boolean; retryAt: Date; error: string },
): void {
  db.update(weatherSeries)
    .set({
      status: outcome.giveUp ? 'failed' : 'queued',
      attempts: sql`${weatherSeries.attempts} + 1`,
      nextAttemptAt: outcome.retryAt,
      lastError: outcome.error.slice(0, 500),
    })
    .where(eq(weatherSeries.id, id))
    .run();
}

/** The stored hours of a series, if it has any. */
export function seriesData(db: DbExecutor, key: SeriesKey): Pick<WeatherSeriesRow, 'ghiWm2' | 'tempC'> | undefined {
  return db
    .select({ ghiWm2: weatherSeries.ghiWm2, tempC: weatherSeries.tempC })
    .from(weatherSeries)
    .where(keyMatch(key))
    .get();
}

const HOUR_MS = 3_600_000;

/** The trips with a stop on a 0.1° place: their budgets change when that place's weather arrives. */
export function bumpTripsAt(db: DbExecutor, place: { latE1: number; lonE1: number }): void {
  const rows = db
    .select({ tripId: stops.tripId, lat: stops.lat, lon: stops.lon })
    .from(stops)
    .where(
      and(
        gte(stops.lat, (place.latE1 - 1) / 10),
        lte(stops.lat, (place.latE1 + 1) / 10),
        gte(stops.lon, (place.lonE1 - 1) / 10),
        lte(stops.lon, (place.lonE1 + 1) / 10),
      ),
    )
    .all();
  const tripIds = [
    ...new Set(
      rows
        .filter((r) => {
          const p = weatherPlace(r.lat, r.lon);
          return p.latE1 === place.latE1 && p.lonE1 === place.lonE1;
        })
        .map((r) => r.tripId),
    ),
  ];
  if (tripIds.length > 0)
    db.update(trips)
      .set({ revision: sql`${trips.revision} + 1` })
      .where(inArray(trips.id, tripIds))
      .run();
}

/**
 * The recorded years and forecasts held for a trip's stops, laid on the trip's calendar for the engine. Years line
 * up by how far back they are from each stop's own dates, so a trip across New Year reads one winter; the most
 * recent MAX_RECORD_YEARS are used. Which of it a stop uses is the stop's own choice, read by the engine.
 */
export function engineWeatherFor(db: DbExecutor, tripStops: readonly StopPlaceAndTime[]): EngineWeather | null {
  if (tripStops.length === 0) return null;
  const byShift = new Map<number, (HourlySky | null)[]>();
  const forecast: (HourlySky | null)[] = [];
  tripStops.forEach((stop, w) => {
    const place = weatherPlace(stop.lat, stop.lon);
    const dates = stopDates(stop);
    const tripStartMs = Date.parse(`${dates.startDate}T00:00:00Z`) - HOUR_MS;
    const rows = db
      .select()
      .from(weatherSeries)
      .where(
        and(
          eq(weatherSeries.latE1, place.latE1),
          eq(weatherSeries.lonE1, place.lonE1),
          sql`${weatherSeries.ghiWm2} is not null`,
        ),
      )
      .all();
    const ownYear = Number(dates.startDate.slice(0, 4));
    let freshest: WeatherSeriesRow | undefined;
    for (const row of rows) {
      if (!row.ghiWm2 || !row.tempC) continue;
      if (row.source === 'forecast') {
        const overlaps = row.startDate <= dates.endDate && row.endDate >= dates.startDate;
        if (overlaps && (!freshest || (row.fetchedAt?.getTime() ?? 0) > (freshest.fetchedAt?.getTime() ?? 0)))
          freshest = row;
        continue;
      }
      const shift = ownYear - Number(row.startDate.slice(0, 4));
      if (shift < 0 || shiftDate(dates.startDate, shift) !== row.startDate) continue;
      if (shiftDate(dates.endDate, shift) !== row.endDate) continue;
      const perStop = byShift.get(shift) ?? Array.from({ length: tripStops.length }, () => null);
      perStop[w] = { startMs: tripStartMs, ghiWm2: row.ghiWm2, tempC: row.tempC };
      byShift.set(shift, perStop);
    }
    forecast[w] =
      freshest?.ghiWm2 && freshest.tempC
        ? {
            startMs: Date.parse(`${freshest.startDate}T00:00:00Z`) - HOUR_MS,
            ghiWm2: freshest.ghiWm2,
            tempC: freshest.tempC,
          }
        : null;
  });
  const firstYear = Number(stopDates(tripStops[0] as StopPlaceAndTime).startDate.slice(0, 4));
  const years = [...byShift.entries()]
    .sort((a, b) => a[0] - b[0])
    .slice(0, MAX_RECORD_YEARS)
    .map(([shift, perStop]) => ({ year: firstYear - shift, stops: perStop }));
  if (years.length === 0 && forecast.every((f) => f === null)) return null;
  return { years, forecast };
}
