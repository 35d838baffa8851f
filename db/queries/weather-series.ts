import { and, asc, eq, inArray, lte, notInArray, or, sql } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { weatherSeries, type WeatherSeriesRow } from '../schema';

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
