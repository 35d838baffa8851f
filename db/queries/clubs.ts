import { and, asc, count, countDistinct, eq, gt, inArray, isNull } from 'drizzle-orm';
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

/** An invite of the club still waiting for an answer: not used, not withdrawn, not expired. */
const waitingIn = (clubId: string, now: Date) =>
  and(
    eq(clubInvites.clubId, clubId),
    isNull(clubInvites.acceptedAt),
    isNull(clubInvites.revokedAt),
    gt(clubInvites.expiresAt, now),
  );

/** The club's waiting invites (optionally only those to some addresses). */
export function listPendingClubInvites(db: DbExecutor, clubId: string, now: Date, emails?: string[]) {
  return db
    .select()
    .from(clubInvites)
    .where(and(waitingIn(clubId, now), emails ? inArray(clubInvites.email, emails) : undefined))
    .orderBy(asc(clubInvites.email))
    .all();
}

/** Lower-cased addresses of the club's members. */
export function listClubMemberEmails(db: DbExecutor, clubId: string): Set<string> {
  return new Set(
    db
      .select({ email: user.email })
      .from(clubMembers)
      .innerJoin(user, eq(user.id, clubMembers.userId))
      .where(eq(clubMembers.clubId, clubId))
      .all()
      .map((row) => row.email.toLowerCase()),
  );
}

export function findPendingClubInvite(db: DbExecutor, clubId: string, inviteId: string, now: Date) {
  return db
    .select()
    .from(clubInvites)
    .where(and(waitingIn(clubId, now), eq(clubInvites.id, inviteId)))
    .get();
}

/** Marks club invites' e-mails as failed (`at`) or delivered (null). */
export function setClubInvitesMailFailed(db: DbExecutor, inviteIds: string[], at: Date | null): void {
  if (inviteIds.length === 0) return;
  db.update(clubInvites).set({ mailFailedAt: at }).where(inArray(clubInvites.id, inviteIds)).run();
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

/** Every club the trip is shared with, for its People tab. */
/** The names of the clubs a trip is shared with, for the trips list. */
export function listSharedClubNames(db: DbExecutor, tripId: string): string[] {
  return db
    .select({ name: clubs.name })
    .from(clubTrips)
    .innerJoin(clubs, eq(clubs.id, clubTrips.clubId))
    .where(eq(clubTrips.tripId, tripId))
    .orderBy(asc(clubs.name))
    .all()
    .map((row) => row.name);
}

export function listTripShares(db: DbExecutor, tripId: string) {
  return db
    .select({ clubId: clubs.id, clubName: clubs.name, sharedByName: user.name, sharedAt: clubTrips.sharedAt })
    .from(clubTrips)
    .innerJoin(clubs, eq(clubs.id, clubTrips.clubId))
    .leftJoin(user, eq(user.id, clubTrips.sharedBy))
    .where(eq(clubTrips.tripId, tripId))
    .orderBy(asc(clubs.name))
    .all()
    .map((share) => ({
      ...share,
      sharedAt: share.sharedAt.toISOString(),
      memberCount: countMembers(db, share.clubId),
    }));
}

export function deleteTripShare(db: DbExecutor, tripId: string, clubId: string): boolean {
  return (
    db
      .delete(clubTrips)
      .where(and(eq(clubTrips.tripId, tripId), eq(clubTrips.clubId, clubId)))
      .run().changes > 0
  );
}

/** Ends the shares of this trip that `userId` made: they go when their maker leaves the trip. */
export function endSharesMadeBy(db: DbExecutor, tripId: string, userId: string): number {
  return db
    .delete(clubTrips)
    .where(and(eq(clubTrips.tripId, tripId), eq(clubTrips.sharedBy, userId)))
    .run().changes;
}
