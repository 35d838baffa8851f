// Keeps each drive's distance and suggested time in step with its two stops (shared/geo/drive-estimate.ts).
import { asc, eq } from 'drizzle-orm';
import { defaultTowingSpeedKmh, planDrive } from '@/shared/geo/drive-estimate';
import type { DbExecutor } from '../client';
import { drives } from '../schema/drives';
import { preferences } from '../schema/preferences';
import type { StopRow } from '../schema/stops';
import { trips } from '../schema/trips';

export function gapHoursBetween(from: Pick<StopRow, 'departAt'>, to: Pick<StopRow, 'arriveAt'>): number {
  return Math.max(0, (Date.parse(to.arriveAt) - Date.parse(from.departAt)) / 3_600_000);
}

/** A new drive follows the suggestion, at the usual towing speed in the trip owner's units. */
export function newDrivePlan(db: DbExecutor, tripId: string) {
  const owner = db
    .select({ units: preferences.units })
    .from(trips)
    .leftJoin(preferences, eq(preferences.userId, trips.ownerId))
    .where(eq(trips.id, tripId))
    .get();
  return {
    hoursSource: 'suggested' as const,
    distanceSource: 'great-circle' as const,
    averageSpeedKmh: defaultTowingSpeedKmh(owner?.units ?? 'metric'),
  };
}

/** Re-plans every drive of the trip against the stops in route order; a drive that changes gets a new version. */
export function planTripDrives(db: DbExecutor, tripId: string, ordered: readonly StopRow[]): void {
  const rows = db.select().from(drives).where(eq(drives.tripId, tripId)).orderBy(asc(drives.position)).all();
  for (const row of rows) {
    const from = ordered[row.position];
    const to = ordered[row.position + 1];
    if (!from || !to) continue;
    const planned = planDrive(row, from, to, gapHoursBetween(from, to));
    if (planned.distanceKm === row.distanceKm && planned.hoursOnRoad === row.hoursOnRoad) continue;
    db.update(drives)
      .set({ distanceKm: planned.distanceKm, hoursOnRoad: planned.hoursOnRoad, version: row.version + 1 })
      .where(eq(drives.id, row.id))
      .run();
  }
}
