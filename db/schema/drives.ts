import { integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import { trips } from './trips';

/** Drive n goes from the stop at position n to the one at n + 1; the API keeps one per gap. */
export const drives = sqliteTable(
  'drives',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    hoursOnRoad: real('hours_on_road').notNull(),
    vehicleCharging: integer('vehicle_charging', { mode: 'boolean' }).notNull(),
    /** Road distance, km (see shared/geo/drive-estimate.ts); null until worked out from the stops. */
    distanceKm: real('distance_km'),
    distanceSource: text('distance_source', { enum: ['great-circle', 'track', 'typed'] })
      .notNull()
      .default('great-circle'),
    roadFactor: real('road_factor').notNull().default(1.3),
    averageSpeedKmh: real('average_speed_kmh').notNull().default(70),
    /** Drives stored before suggestions existed keep the hours someone set: hence the default. */
    hoursSource: text('hours_source', { enum: ['suggested', 'typed'] })
      .notNull()
      .default('typed'),
    version: integer('version').notNull().default(1),
  },
  (table) => [uniqueIndex('drives_trip_position_idx').on(table.tripId, table.position)],
);

export type DriveRow = typeof drives.$inferSelect;
