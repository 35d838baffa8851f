import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';
import { trips } from './trips';

/** Who changed what on a trip, and when: one line per change, newest read first. */
export const activity = sqliteTable(
  'activity',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    userId: text('user_id').references(() => user.id, { onDelete: 'set null' }),
    at: integer('at', { mode: 'timestamp_ms' }).notNull(),
    summary: text('summary').notNull(),
    /**
     * Who may read the line: 'members' marks lines about invites and club shares (they name e-mail
     * addresses and clubs), which readers who see the trip only through a club never get.
     */
    audience: text('audience', { enum: ['everyone', 'members'] })
      .notNull()
      .default('everyone'),
  },
  (table) => [index('activity_trip_idx').on(table.tripId, table.at)],
);
