import { and, count, eq, isNull } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { rigs } from '../schema/rigs';
import { trips } from '../schema/trips';

/** Trips a person owns (not those they were invited to). */
export function countOwnedTrips(db: DbExecutor, ownerId: string): number {
  return db.select({ n: count() }).from(trips).where(eq(trips.ownerId, ownerId)).get()?.n ?? 0;
}

/** Rigs a person keeps in My rigs (a trip's own rig is not one of them). */
export function countSavedRigs(db: DbExecutor, ownerId: string): number {
  return (
    db
      .select({ n: count() })
      .from(rigs)
      .where(and(eq(rigs.ownerId, ownerId), isNull(rigs.tripId)))
      .get()?.n ?? 0
  );
}
