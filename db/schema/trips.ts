import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';

// A trip's dates are calendar dates (YYYY-MM-DD) in the trip's own time zone; the budget engine
// turns them into UTC hours, so they are stored as text and never as instants.
export const trips = sqliteTable(
  'trips',
  {
    id: text('id').primaryKey(),
    ownerId: text('owner_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    startDate: text('start_date').notNull(),
    endDate: text('end_date').notNull(),
    timeZone: text('time_zone').notNull(),
    notes: text('notes').notNull().default(''),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    updatedAt: integer('updated_at', { mode: 'timestamp_ms' }).notNull(),
    // Bumped when the trip's own fields or its stop order change; edits to them carry the version
    // they were based on (optimistic concurrency).
    version: integer('version').notNull().default(1),
    // Bumped on any change to the trip or anything in it (stops, drives, rig, appliances): the
    // budget's cache key and ETag.
    revision: integer('revision').notNull().default(1),
    // Bumped when stops or drives change: copies of a shared trip compare it to say "the route changed".
    routeRevision: integer('route_revision').notNull().default(1),
  },
  (table) => [index('trips_owner_idx').on(table.ownerId)],
);

export type TripRow = typeof trips.$inferSelect;
export type NewTripRow = typeof trips.$inferInsert;
