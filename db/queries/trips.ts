import { and, asc, eq } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { trips } from '../schema/trips';
import type { TripRow } from '../schema/trips';
import type { TripSummary } from '@/shared/schemas/trip-summary';

export function toTripSummary(row: TripRow): TripSummary {
  return {
    id: row.id,
    name: row.name,
    startDate: row.startDate,
    endDate: row.endDate,
    timeZone: row.timeZone,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function listTripsForOwner(db: DbExecutor, ownerId: string): TripRow[] {
  return db.select().from(trips).where(eq(trips.ownerId, ownerId)).orderBy(asc(trips.startDate)).all();
}

export function findTripForOwner(db: DbExecutor, ownerId: string, tripId: string): TripRow | undefined {
  return db
    .select()
    .from(trips)
    .where(and(eq(trips.id, tripId), eq(trips.ownerId, ownerId)))
    .get();
}

export type NewTrip = { ownerId: string; name: string; startDate: string; endDate: string; timeZone: string };

export function insertTrip(db: DbExecutor, trip: NewTrip, now: Date, id: string = crypto.randomUUID()): TripRow {
  return db
    .insert(trips)
    .values({ id, ...trip, createdAt: now, updatedAt: now, version: 1 })
    .returning()
    .get();
}
