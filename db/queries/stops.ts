import { and, asc, eq } from 'drizzle-orm';
import { DateTime } from 'luxon';
import type { Stop } from '@/shared/schemas/trip';
import type { DbExecutor } from '../client';
import { drives, type DriveRow } from '../schema/drives';
import { stops, type StopRow } from '../schema/stops';
import { newDrivePlan, planTripDrives } from './drive-plans';
import { stopToColumns } from './mappers';

/** A new drive's hours until planTripDrives suggests them from its stops' distance (drive-plans.ts). */
const DEFAULT_DRIVE_HOURS = 2;

export function listStopRows(db: DbExecutor, tripId: string): StopRow[] {
  return db.select().from(stops).where(eq(stops.tripId, tripId)).orderBy(asc(stops.position)).all();
}

export function findStopRow(db: DbExecutor, tripId: string, stopId: string): StopRow | undefined {
  return db
    .select()
    .from(stops)
    .where(and(eq(stops.tripId, tripId), eq(stops.id, stopId)))
    .get();
}

export function insertStop(db: DbExecutor, tripId: string, stop: Stop, notes: string): StopRow {
  const id = crypto.randomUUID();
  // Park it past the end; resequence puts it in time order.
  db.insert(stops)
    .values({
      id,
      tripId,
      position: 10_000 + listStopRows(db, tripId).length,
      ...stopToColumns(stop),
      notes,
      version: 1,
    })
    .run();
  resequenceStops(db, tripId);
  return findStopRow(db, tripId, id) as StopRow;
}

export type VersionedWrite<T> = { status: 'ok'; row: T } | { status: 'conflict'; current: T } | { status: 'missing' };

export function updateStop(
  db: DbExecutor,
  tripId: string,
  stopId: string,
  version: number,
  stop: Stop,
  notes?: string,
): VersionedWrite<StopRow> {
  const current = findStopRow(db, tripId, stopId);
  if (!current) return { status: 'missing' };
  if (current.version !== version) return { status: 'conflict', current };
  db.update(stops)
    .set({ ...stopToColumns(stop), notes: notes ?? current.notes, version: version + 1 })
    .where(and(eq(stops.id, stopId), eq(stops.version, version)))
    .run();
  resequenceStops(db, tripId);
  return { status: 'ok', row: findStopRow(db, tripId, stopId) as StopRow };
}

export function deleteStop(db: DbExecutor, tripId: string, stopId: string): boolean {
  const result = db
    .delete(stops)
    .where(and(eq(stops.tripId, tripId), eq(stops.id, stopId)))
    .run();
  if (result.changes === 0) return false;
  resequenceStops(db, tripId);
  return true;
}

/** Writes positions 0…n−1 in the given order, in two passes so the unique index never clashes. */
function writePositions(db: DbExecutor, ordered: StopRow[]): void {
  ordered.forEach((row, i) =>
    db
      .update(stops)
      .set({ position: -1 - i })
      .where(eq(stops.id, row.id))
      .run(),
  );
  ordered.forEach((row, i) => db.update(stops).set({ position: i }).where(eq(stops.id, row.id)).run());
}

/** Keeps stops in time order and one drive in each gap between consecutive stops. */
export function resequenceStops(db: DbExecutor, tripId: string): void {
  const ordered = [...listStopRows(db, tripId)].sort((a, b) => Date.parse(a.arriveAt) - Date.parse(b.arriveAt));
  writePositions(db, ordered);
  syncDrives(db, tripId, ordered);
}

function gapHours(from: StopRow, to: StopRow): number {
  return Math.max(0, (Date.parse(to.arriveAt) - Date.parse(from.departAt)) / 3_600_000);
}

function syncDrives(db: DbExecutor, tripId: string, ordered: StopRow[]): void {
  const existing: DriveRow[] = db
    .select()
    .from(drives)
    .where(eq(drives.tripId, tripId))
    .orderBy(asc(drives.position))
    .all();
  const wanted = Math.max(0, ordered.length - 1);
  for (const extra of existing.slice(wanted)) db.delete(drives).where(eq(drives.id, extra.id)).run();
  for (let i = 0; i < wanted; i += 1) {
    const from = ordered[i];
    const to = ordered[i + 1];
    if (!from || !to) continue;
    const gap = gapHours(from, to);
    const drive = existing[i];
    if (!drive) {
      db.insert(drives)
        .values({
          id: crypto.randomUUID(),
          tripId,
          position: i,
          hoursOnRoad: Math.min(DEFAULT_DRIVE_HOURS, gap),
          vehicleCharging: true,
          version: 1,
          ...newDrivePlan(db, tripId),
        })
        .run();
    } else if (drive.hoursOnRoad > gap) {
      // A drive cannot last longer than the time between leaving one stop and reaching the next.
      db.update(drives)
        .set({ hoursOnRoad: gap, version: drive.version + 1 })
        .where(eq(drives.id, drive.id))
        .run();
    }
  }
  planTripDrives(db, tripId, ordered);
}

/**
 * Puts the stops in a new order. Each stop keeps how long it lasts and each gap keeps its length,
 * so moving a stop earlier moves its nights earlier: the route is laid out again from the first
 * arrival. Times are written back in each stop's own time zone.
 */
export function reorderStops(db: DbExecutor, tripId: string, stopIds: string[]): 'ok' | 'mismatch' {
  const current = listStopRows(db, tripId);
  const byId = new Map(current.map((row) => [row.id, row]));
  if (
    stopIds.length !== current.length ||
    new Set(stopIds).size !== stopIds.length ||
    !stopIds.every((id) => byId.has(id))
  ) {
    return 'mismatch';
  }
  const gaps = current.slice(1).map((row, i) => {
    const previous = current[i];
    return previous ? Date.parse(row.arriveAt) - Date.parse(previous.departAt) : 0;
  });
  let cursor = Date.parse(current[0]?.arriveAt ?? new Date(0).toISOString());
  const reordered = stopIds.map((id, i) => {
    const row = byId.get(id) as StopRow;
    const stayMs = Date.parse(row.departAt) - Date.parse(row.arriveAt);
    const arriveAt = toZonedIso(cursor, row.timeZone);
    const departAt = toZonedIso(cursor + stayMs, row.timeZone);
    cursor += stayMs + (gaps[i] ?? 0);
    return { ...row, arriveAt, departAt };
  });
  for (const row of reordered) {
    db.update(stops)
      .set({ arriveAt: row.arriveAt, departAt: row.departAt, version: row.version + 1 })
      .where(eq(stops.id, row.id))
      .run();
  }
  writePositions(db, reordered);
  syncDrives(db, tripId, reordered);
  return 'ok';
}

function toZonedIso(epochMs: number, zone: string): string {
  return (
    DateTime.fromMillis(epochMs, { zone }).toISO({
      suppressMilliseconds: true,
      suppressSeconds: true,
      includeOffset: true,
    }) ?? new Date(epochMs).toISOString()
  );
}
