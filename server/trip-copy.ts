import { asc, eq, inArray } from 'drizzle-orm';
import type { Db, DbExecutor } from '@/db/client';
import { insertAppliance } from '@/db/queries/appliances';
import { rigFromRow } from '@/db/queries/mappers';
import { findTrip, findTripRig, insertRig, insertTrip, logActivity } from '@/db/queries/trips';
import { appliances, routineWindows } from '@/db/schema/appliances';
import { drives } from '@/db/schema/drives';
import { stops } from '@/db/schema/stops';
import type { ApplianceFields } from '@/shared/schemas/appliance';
import type { Rig } from '@/shared/schemas/rig';
import { notFound } from './errors';
import { ensureRoomForTrip } from './owner-limits';

/** What the copy runs on, for "copy onto my rig": the saved rig, its usual loads, and which of the plan's own
 * appliances come along (the rest of the plan's list stays with the plan). */
export type OntoRig = { rig: Rig; loads: readonly ApplianceFields[]; sharedApplianceIds: readonly string[] };

/**
 * Copies a trip with its rig, stops, drives, appliances and routines into a new trip owned by
 * `ownerId`, in one transaction. With `onto`, the copy runs on that rig with its loads instead.
 */
export function duplicateTrip(
  db: Db | DbExecutor,
  tripId: string,
  ownerId: string,
  at: Date,
  options: { name?: string; onto?: OntoRig } = {},
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
    const onto = options.onto;
    insertRig(tx, { ownerId, tripId: copy.id }, onto?.rig ?? rigFromRow(sourceRig), at);
    // The household's own loads first, then the plan's shared ones it ticked.
    for (const load of onto?.loads ?? []) insertAppliance(tx, copy.id, load, null);

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
    const sourceAppliances = tx
      .select()
      .from(appliances)
      .where(eq(appliances.tripId, tripId))
      .orderBy(asc(appliances.position))
      .all()
      .filter((appliance) => !onto || onto.sharedApplianceIds.includes(appliance.id));
    const firstPosition = onto?.loads.length ?? 0;
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
    for (const [i, appliance] of sourceAppliances.entries()) {
      const id = crypto.randomUUID();
      // The caretaker is a member of the original trip, not necessarily of the copy.
      tx.insert(appliances)
        .values({
          ...appliance,
          id,
          tripId: copy.id,
          position: onto ? firstPosition + i : appliance.position,
          caretakerUserId: null,
          version: 1,
        })
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
