import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';
import { trips } from './trips';

/**
 * A calendar subscription address for one member on one trip. Like invite links, only a SHA-256 hash of the
 * secret token is stored; the address itself is shown once, when it is made. Revoking it stops it at once.
 */
export const calendarFeeds = sqliteTable(
  'calendar_feeds',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    tokenHash: text('token_hash').notNull().unique(),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    lastFetchedAt: integer('last_fetched_at', { mode: 'timestamp_ms' }),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (table) => [index('calendar_feeds_trip_user_idx').on(table.tripId, table.userId)],
);

export type CalendarFeedRow = typeof calendarFeeds.$inferSelect;
