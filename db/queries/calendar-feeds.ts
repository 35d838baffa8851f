import { and, desc, eq, isNull } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { calendarFeeds, type CalendarFeedRow } from '../schema/calendar-feeds';

export function insertCalendarFeed(
  db: DbExecutor,
  feed: { tripId: string; userId: string; tokenHash: string },
  now: Date,
): CalendarFeedRow {
  return db
    .insert(calendarFeeds)
    .values({ id: crypto.randomUUID(), ...feed, createdAt: now })
    .returning()
    .get();
}

/** The member's own addresses for the trip, newest first, revoked ones left out. */
export function listActiveFeeds(db: DbExecutor, tripId: string, userId: string): CalendarFeedRow[] {
  return db
    .select()
    .from(calendarFeeds)
    .where(and(eq(calendarFeeds.tripId, tripId), eq(calendarFeeds.userId, userId), isNull(calendarFeeds.revokedAt)))
    .orderBy(desc(calendarFeeds.createdAt))
    .all();
}

export function findFeed(db: DbExecutor, tripId: string, feedId: string): CalendarFeedRow | undefined {
  return db
    .select()
    .from(calendarFeeds)
    .where(and(eq(calendarFeeds.tripId, tripId), eq(calendarFeeds.id, feedId)))
    .get();
}

export function findFeedByHash(db: DbExecutor, tokenHash: string): CalendarFeedRow | undefined {
  return db.select().from(calendarFeeds).where(eq(calendarFeeds.tokenHash, tokenHash)).get();
}

export function revokeFeed(db: DbExecutor, feedId: string, now: Date): void {
  db.update(calendarFeeds).set({ revokedAt: now }).where(eq(calendarFeeds.id, feedId)).run();
}

export function markFeedFetched(db: DbExecutor, feedId: string, now: Date): void {
  db.update(calendarFeeds).set({ lastFetchedAt: now }).where(eq(calendarFeeds.id, feedId)).run();
}
