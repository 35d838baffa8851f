import { index, integer, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

/**
 * One place's hourly weather over one range of UTC dates from one source: a past year's record (`record`) or the
 * forecast (`forecast`). Keyed by the place rounded to 0.1° (the services' grids are coarser), so every trip at
 * that place shares it. A row is also its own queue entry: `queued` rows are fetched in the background, `failed`
 * ones gave up (after retries, or because the service refused the query). Data columns are kept while a forecast
 * row is queued to be refreshed.
 */
export const weatherSeries = sqliteTable(
  'weather_series',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    latE1: integer('lat_e1').notNull(),
    lonE1: integer('lon_e1').notNull(),
    /** Inclusive UTC dates, YYYY-MM-DD. */
    startDate: text('start_date').notNull(),
    endDate: text('end_date').notNull(),
    source: text('source', { enum: ['record', 'forecast'] }).notNull(),
    status: text('status', { enum: ['queued', 'ready', 'failed'] }).notNull(),
    attempts: integer('attempts').notNull().default(0),
    /** Earliest time the next attempt may start (back-off after a failure). */
    nextAttemptAt: integer('next_attempt_at', { mode: 'timestamp_ms' }).notNull(),
    fetchedAt: integer('fetched_at', { mode: 'timestamp_ms' }),
    /** Hourly values from startDate 00:00 UTC, one per hour (GHI: the preceding hour's mean, W/m²); null: a gap. */
    ghiWm2: text('ghi_wm2', { mode: 'json' }).$type<(number | null)[]>(),
    tempC: text('temp_c', { mode: 'json' }).$type<(number | null)[]>(),
    lastError: text('last_error'),
  },
  (table) => [
    uniqueIndex('weather_series_key_idx').on(table.latE1, table.lonE1, table.startDate, table.endDate, table.source),
    index('weather_series_queue_idx').on(table.status, table.nextAttemptAt),
  ],
);

export type WeatherSeriesRow = typeof weatherSeries.$inferSelect;
