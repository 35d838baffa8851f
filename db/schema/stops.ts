import { index, integer, real, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';
import type { SiteExposure } from '@/shared/schemas/trip';
import { trips } from './trips';

export const stops = sqliteTable(
  'stops',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    /** Route order, 0-based, dense. */
    position: integer('position').notNull(),
    name: text('name').notNull(),
    lat: real('lat').notNull(),
    lon: real('lon').notNull(),
    elevationM: real('elevation_m').notNull(),
    timeZone: text('time_zone').notNull(),
    /** Instants as ISO strings with their offset, as the user entered them. */
    arriveAt: text('arrive_at').notNull(),
    departAt: text('depart_at').notNull(),
    exposure: text('exposure', { mode: 'json' }).$type<SiteExposure>().notNull(),
    skyOutlook: text('sky_outlook', { enum: ['clear', 'hazy', 'broken-cloud', 'overcast'] }).notNull(),
    skySource: text('sky_source', { enum: ['record', 'forecast', 'preset'] })
      .notNull()
      .default('record'),
    linkeTurbidity: real('linke_turbidity'),
    hookupAmps: real('hookup_amps'),
    hookupVolts: real('hookup_volts'),
    generatorStartHour: integer('generator_start_hour'),
    generatorEndHour: integer('generator_end_hour'),
    lowC: real('low_c').notNull(),
    highC: real('high_c').notNull(),
    ownTemperatures: integer('own_temperatures', { mode: 'boolean' }).notNull().default(false),
    notes: text('notes').notNull().default(''),
    version: integer('version').notNull().default(1),
  },
  (table) => [
    index('stops_trip_idx').on(table.tripId),
    uniqueIndex('stops_trip_position_idx').on(table.tripId, table.position),
  ],
);

export type StopRow = typeof stops.$inferSelect;
