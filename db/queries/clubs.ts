import { and, asc, count, countDistinct, eq, gt, isNull } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { user } from '../schema/auth';
import { clubInvites, clubMembers, clubs, clubTrips, tripCopies } from '../schema/clubs';
import { trips } from '../schema/trips';

export function findClubRole(db: DbExecutor, clubId: string, userId: string) {
  return db
    .select({ role: clubMembers.role })
    .from(clubMembers)
    .where(and(eq(clubMembers.clubId, clubId), eq(clubMembers.userId, userId)))
    .get()?.role;
}

export function listClubsForUser(db: DbExecutor, userId: string) {
  return db
    .select({ id: clubs.id, name: clubs.name, role: clubMembers.role })
    .from(clubMembers)
    .innerJoin(clubs, eq(clubs.id, clubMembers.clubId))
    .where(eq(clubMembers.userId, userId))
    .orderBy(asc(clubs.name))
    .all()
    .map((club) => ({
      ...club,
      memberCount: countMembers(db, club.id),
      sharedTripCount: listClubTrips(db, club.id).length,
    }));
}

/** Clubs the user organises (LIMITS.clubsPerUser bounds them). */
export function countOrganisedClubs(db: DbExecutor, userId: string): number {
  return (
    db
      .select({ n: count() })
      .from(clubMembers)
      .where(and(eq(clubMembers.userId, userId), eq(clubMembers.role, 'organiser')))
      .get()?.n ?? 0
  );
}

function countMembers(db: DbExecutor, clubId: string): number {
  return db.select({ n: count() }).from(clubMembers).where(eq(clubMembers.clubId, clubId)).get()?.n ?? 0;
}

export function listClubMembers(db: DbExecutor, clubId: string) {
  return db
    .select({ userId: user.id, name: user.name, role: clubMembers.role })
    .from(clubMembers)
    .innerJoin(user, eq(user.id, clubMembers.userId))
    .where(eq(clubMembers.clubId, clubId))
    .orderBy(asc(user.name))
    .all();
}

export function listPendingClubInvites(db: DbExecutor, clubId: string, now: Date) {
  return db
    .select()
    .from(clubInvites)
    .where(
      and(
        eq(clubInvites.clubId, clubId),
        isNull(clubInvites.acceptedAt),
        isNull(clubInvites.revokedAt),
        gt(clubInvites.expiresAt, now),
      ),
    )
    .orderBy(asc(clubInvites.email))
    .all();
}

export function listClubTrips(db: DbExecutor, clubId: string) {
  return db
    .select({
      tripId: trips.id,
      name: trips.name,
      startDate: trips.startDate,
      endDate: trips.endDate,
      sharedByName: user.name,
    })
    .from(clubTrips)
    .innerJoin(trips, eq(trips.id, clubTrips.tripId))
    .leftJoin(user, eq(user.id, clubTrips.sharedBy))
    .where(eq(clubTrips.clubId, clubId))
    .orderBy(asc(trips.startDate))
    .all();
}

/** Households that copied a trip: a count only, never who or what. */
export function countCopies(db: DbExecutor, sourceTripId: string): number {
  return (
    db
      .select({ n: countDistinct(tripCopies.userId) })
      .from(tripCopies)
      .where(eq(tripCopies.sourceTripId, sourceTripId))
      .get()?.n ?? 0
  );
}

export function findMyCopy(db: DbExecutor, sourceTripId: string, userId: string): string | null {
  return (
    db
      .select({ id: tripCopies.copyTripId })
      .from(tripCopies)
      .where(and(eq(tripCopies.sourceTripId, sourceTripId), eq(tripCopies.userId, userId)))
      .get()?.id ?? null
  );
}

/** Whether the user may read the trip because it is shared to one of their clubs. */
export function sharedToUserClub(db: DbExecutor, tripId: string, userId: string): boolean {
  const row = db
    .select({ clubId: clubTrips.clubId })
    .from(clubTrips)
    .innerJoin(clubMembers, and(eq(clubMembers.clubId, clubTrips.clubId), eq(clubMembers.userId, userId)))
    .where(eq(clubTrips.tripId, tripId))
    .get();
  return row !== undefined;
}
