import { index, integer, real, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import type { CylinderReading } from '@/shared/schemas/check-in';
import { user } from './auth';
import { trips } from './trips';

/** Readings taken on the road; the rest of the trip is re-forecast from the latest one. */
export const checkIns = sqliteTable(
  'check_ins',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    /** Null once the author's account is gone: the reading stays, nobody can edit it. */
    authorId: text('author_id').references(() => user.id, { onDelete: 'set null' }),
    /** When the reading was taken, as an ISO instant with the offset the phone gave. */
    at: text('at').notNull(),
    /** Milliseconds of `at`, for ordering. */
    atMs: integer('at_ms').notNull(),
    socPct: real('soc_pct').notNull(),
    propane: text('propane', { mode: 'json' }).$type<CylinderReading[]>().notNull(),
    harvestWh: real('harvest_wh'),
    note: text('note').notNull().default(''),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    version: integer('version').notNull().default(1),
  },
  (table) => [index('check_ins_trip_at_idx').on(table.tripId, table.atMs)],
);

export type CheckInRow = typeof checkIns.$inferSelect;
