import { and, asc, desc, eq, sql } from 'drizzle-orm';
import type { ApplianceFields } from '@/shared/schemas/appliance';
import type { TripDetail } from '@/shared/schemas/api';
import type { Role } from '@/shared/schemas/roles';
import type { Rig } from '@/shared/schemas/rig';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import type { DbExecutor } from '../client';
import { activity } from '../schema/activity';
import { appliances, routineWindows } from '../schema/appliances';
import { user } from '../schema/auth';
import { drives } from '../schema/drives';
import { memberships } from '../schema/memberships';
import { rigs } from '../schema/rigs';
import { stops } from '../schema/stops';
import { trips, type TripRow } from '../schema/trips';
import { tripCopies } from '../schema/clubs';
import { applianceRecord, driveRecord, rigRecord, rigToColumns, stopRecord } from './mappers';

export function toTripSummary(row: TripRow, extra: Partial<TripSummary> = {}): TripSummary {
  return {
    id: row.id,
    name: row.name,
    startDate: row.startDate,
    endDate: row.endDate,
    timeZone: row.timeZone,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    ...extra,
  };
}

/** Trips the user belongs to, with their role, in date order. */
export function listTripsForMember(db: DbExecutor, userId: string): { trip: TripRow; role: Role }[] {
  return db
    .select({ trip: trips, role: memberships.role })
    .from(memberships)
    .innerJoin(trips, eq(trips.id, memberships.tripId))
    .where(eq(memberships.userId, userId))
    .orderBy(asc(trips.startDate), asc(trips.name))
    .all();
}

/**
 * The two look-ups every request on a trip makes (who may read it, and its revision), built and prepared once per
 * connection: building a query anew costs more than SQLite takes to run it.
 */
function prepareHotLookups(db: DbExecutor) {
  return {
    membership: db
      .select({ role: memberships.role })
      .from(memberships)
      .where(and(eq(memberships.tripId, sql.placeholder('tripId')), eq(memberships.userId, sql.placeholder('userId'))))
      .prepare(),
    trip: db
      .select()
      .from(trips)
      .where(eq(trips.id, sql.placeholder('tripId')))
      .prepare(),
  };
}

const hotLookups = new WeakMap<DbExecutor, ReturnType<typeof prepareHotLookups>>();

function hotLookupsOf(db: DbExecutor): ReturnType<typeof prepareHotLookups> {
  let lookups = hotLookups.get(db);
  if (!lookups) {
    lookups = prepareHotLookups(db);
    hotLookups.set(db, lookups);
  }
  return lookups;
}

export function findMembership(db: DbExecutor, tripId: string, userId: string): { role: Role } | undefined {
  return hotLookupsOf(db).membership.get({ tripId, userId });
}

export function findTrip(db: DbExecutor, tripId: string): TripRow | undefined {
  return hotLookupsOf(db).trip.get({ tripId });
}

export function findTripRig(db: DbExecutor, tripId: string) {
  return db.select().from(rigs).where(eq(rigs.tripId, tripId)).get();
}

/** Everything a trip's screens and its budget need, in route order. */
export function loadTripDetail(db: DbExecutor, tripId: string, role: Role): TripDetail | undefined {
  const trip = findTrip(db, tripId);
  const rig = findTripRig(db, tripId);
  if (!trip || !rig) return undefined;
  const stopRows = db.select().from(stops).where(eq(stops.tripId, tripId)).orderBy(asc(stops.position)).all();
  const driveRows = db.select().from(drives).where(eq(drives.tripId, tripId)).orderBy(asc(drives.position)).all();
  const applianceRows = db
    .select()
    .from(appliances)
    .where(eq(appliances.tripId, tripId))
    .orderBy(asc(appliances.position))
    .all();
  const windowRows = db
    .select({ window: routineWindows })
    .from(routineWindows)
    .innerJoin(appliances, eq(appliances.id, routineWindows.applianceId))
    .where(eq(appliances.tripId, tripId))
    .all()
    .map((row) => row.window);
  const copyOf = db.select().from(tripCopies).where(eq(tripCopies.copyTripId, tripId)).get();
  const source = copyOf ? findTrip(db, copyOf.sourceTripId) : undefined;
  return {
    basedOn:
      copyOf && source
        ? { tripId: source.id, name: source.name, routeChanged: source.routeRevision > copyOf.sourceRouteRevision }
        : null,
    trip: { ...toTripSummary(trip), notes: trip.notes, ownerId: trip.ownerId, role },
    rig: rigRecord(rig),
    stops: stopRows.map(stopRecord),
    drives: driveRows.map(driveRecord),
    appliances: applianceRows.map((row) =>
      applianceRecord(
        row,
        windowRows.filter((w) => w.applianceId === row.id),
      ),
    ),
  };
}

export type NewTrip = {
  ownerId: string;
  name: string;
  startDate: string;
  endDate: string;
  timeZone: string;
  notes?: string;
};

/** Inserts the trip row and makes its creator the owner member. */
export function insertTrip(db: DbExecutor, trip: NewTrip, now: Date, id: string = crypto.randomUUID()): TripRow {
  const row = db
    .insert(trips)
    .values({
      id,
      ...trip,
      notes: trip.notes ?? '',
      createdAt: now,
      updatedAt: now,
      version: 1,
      revision: 1,
      routeRevision: 1,
    })
    .returning()
    .get();
  db.insert(memberships).values({ tripId: id, userId: trip.ownerId, role: 'owner', createdAt: now }).run();
  return row;
}

/** `loads` only for one of My rigs: a trip keeps its appliances in their own table. */
export function insertRig(
  db: DbExecutor,
  owner: { ownerId: string; tripId: string | null },
  rig: Rig,
  now: Date,
  loads: ApplianceFields[] | null = null,
) {
  return db
    .insert(rigs)
    .values({
      id: crypto.randomUUID(),
      ...owner,
      ...rigToColumns(rig),
      loads: owner.tripId === null ? loads : null,
      version: 1,
      createdAt: now,
      updatedAt: now,
    })
    .returning()
    .get();
}

/** Marks the trip changed so cached budgets and ETags are renewed. */
export function touchTrip(
  db: DbExecutor,
  tripId: string,
  now: Date,
  { bumpVersion = false, routeChanged = false } = {},
): void {
  db.update(trips)
    .set({
      revision: sql`${trips.revision} + 1`,
      updatedAt: now,
      ...(bumpVersion ? { version: sql`${trips.version} + 1` } : {}),
      ...(routeChanged ? { routeRevision: sql`${trips.routeRevision} + 1` } : {}),
    })
    .where(eq(trips.id, tripId))
    .run();
}

export function logActivity(
  db: DbExecutor,
  entry: { tripId: string; userId: string | null; summary: string; at: Date; audience?: 'everyone' | 'members' },
): void {
  db.insert(activity).values(entry).run();
}

/** The newest lines first; `everyoneOnly` leaves out the lines meant for the trip's members alone. */
export function listActivity(db: DbExecutor, tripId: string, { limit = 100, everyoneOnly = false } = {}) {
  return db
    .select({
      id: activity.id,
      at: activity.at,
      userId: activity.userId,
      userName: user.name,
      summary: activity.summary,
    })
    .from(activity)
    .leftJoin(user, eq(user.id, activity.userId))
    .where(and(eq(activity.tripId, tripId), everyoneOnly ? eq(activity.audience, 'everyone') : undefined))
    .orderBy(desc(activity.at), desc(activity.id))
    .limit(limit)
    .all();
}
