import { asc, eq, inArray } from 'drizzle-orm';
import type { Db, DbExecutor } from '@/db/client';
import { rigFromRow } from '@/db/queries/mappers';
import { findTrip, findTripRig, insertRig, insertTrip, logActivity } from '@/db/queries/trips';
import { appliances, routineWindows } from '@/db/schema/appliances';
import { drives } from '@/db/schema/drives';
import { stops } from '@/db/schema/stops';
import type { Rig } from '@/shared/schemas/rig';
import { notFound } from './errors';
import { ensureRoomForTrip } from './owner-limits';

/**
 * Copies a trip with its rig, stops, drives, appliances and routines into a new trip owned by
 * `ownerId`, in one transaction. `rig` replaces the copied rig (for "copy onto my rig").
 */
export function duplicateTrip(
  db: Db | DbExecutor,
  tripId: string,
  ownerId: string,
  at: Date,
  options: { name?: string; rig?: Rig } = {},
): string {
  return db.transaction((tx) => {
    const source = findTrip(tx, tripId);
    const sourceRig = findTripRig(tx, tripId);
    if (!source || !sourceRig) throw notFound('That trip was not found.');
    ensureRoomForTrip(tx, ownerId);
    const copy = insertTrip(
      tx,
      {
        ownerId,
        name: options.name ?? `${source.name} (copy)`,
        startDate: source.startDate,
        endDate: source.endDate,
        timeZone: source.timeZone,
        notes: source.notes,
      },
      at,
    );
    insertRig(tx, { ownerId, tripId: copy.id }, options.rig ?? rigFromRow(sourceRig), at);

    for (const stop of tx.select().from(stops).where(eq(stops.tripId, tripId)).orderBy(asc(stops.position)).all()) {
      tx.insert(stops)
        .values({ ...stop, id: crypto.randomUUID(), tripId: copy.id, version: 1 })
        .run();
    }
    for (const drive of tx.select().from(drives).where(eq(drives.tripId, tripId)).all()) {
      tx.insert(drives)
        .values({ ...drive, id: crypto.randomUUID(), tripId: copy.id, version: 1 })
        .run();
    }
    const sourceAppliances = tx.select().from(appliances).where(eq(appliances.tripId, tripId)).all();
    const windows = sourceAppliances.length
      ? tx
          .select()
          .from(routineWindows)
          .where(
            inArray(
              routineWindows.applianceId,
              sourceAppliances.map((a) => a.id),
            ),
          )
          .all()
      : [];
    for (const appliance of sourceAppliances) {
      const id = crypto.randomUUID();
      // The caretaker is a member of the original trip, not necessarily of the copy.
      tx.insert(appliances)
        .values({ ...appliance, id, tripId: copy.id, caretakerUserId: null, version: 1 })
        .run();
      for (const window of windows.filter((w) => w.applianceId === appliance.id)) {
        const { id: _windowId, ...rest } = window;
        tx.insert(routineWindows)
          .values({ ...rest, applianceId: id })
          .run();
      }
    }
    logActivity(tx, { tripId: copy.id, userId: ownerId, summary: `copied this trip from "${source.name}"`, at });
    return copy.id;
  });
}
