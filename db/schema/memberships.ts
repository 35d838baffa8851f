import { index, integer, primaryKey, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';
import { trips } from './trips';

export const memberships = sqliteTable(
  'memberships',
  {
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ['owner', 'planner', 'crew', 'viewer'] }).notNull(),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.tripId, table.userId] }), index('memberships_user_idx').on(table.userId)],
);

export type MembershipRow = typeof memberships.$inferSelect;
