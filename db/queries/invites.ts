import { and, asc, eq, gt, gte, isNull, lt, sql } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { user } from '../schema/auth';
import { inviteMailings, tripInvites, type TripInviteRow } from '../schema/invites';

export function insertTripInvite(
  db: DbExecutor,
  values: Omit<TripInviteRow, 'acceptedAt' | 'acceptedBy' | 'revokedAt' | 'mailFailedAt'>,
): TripInviteRow {
  return db.insert(tripInvites).values(values).returning().get();
}

export function findInviteByHash(db: DbExecutor, tokenHash: string): TripInviteRow | undefined {
  return db.select().from(tripInvites).where(eq(tripInvites.tokenHash, tokenHash)).get();
}

export function findTripInvite(db: DbExecutor, tripId: string, inviteId: string): TripInviteRow | undefined {
  return db
    .select()
    .from(tripInvites)
    .where(and(eq(tripInvites.tripId, tripId), eq(tripInvites.id, inviteId)))
    .get();
}

/** Invites still waiting for an answer: not used, not withdrawn, not expired. */
export function listPendingTripInvites(db: DbExecutor, tripId: string, now: Date) {
  return db
    .select({ invite: tripInvites, invitedByName: user.name })
    .from(tripInvites)
    .leftJoin(user, eq(user.id, tripInvites.invitedBy))
    .where(
      and(
        eq(tripInvites.tripId, tripId),
        isNull(tripInvites.acceptedAt),
        isNull(tripInvites.revokedAt),
        gt(tripInvites.expiresAt, now),
      ),
    )
    .orderBy(asc(tripInvites.createdAt))
    .all();
}

/**
 * Withdraws every invite to this trip still waiting for `email`: someone removed from a trip must not
 * come back through a link sent before.
 */
export function revokePendingTripInvitesTo(db: DbExecutor, tripId: string, email: string, at: Date): number {
  return db
    .update(tripInvites)
    .set({ revokedAt: at })
    .where(
      and(
        eq(tripInvites.tripId, tripId),
        sql`lower(${tripInvites.email}) = ${email.toLowerCase()}`,
        isNull(tripInvites.acceptedAt),
        isNull(tripInvites.revokedAt),
      ),
    )
    .run().changes;
}

/** Marks an invite's e-mail as failed (`at`) or delivered (null). */
export function setTripInviteMailFailed(db: DbExecutor, inviteId: string, at: Date | null): void {
  db.update(tripInvites).set({ mailFailedAt: at }).where(eq(tripInvites.id, inviteId)).run();
}

/** When each invite e-mail the user asked for since `since` was asked for, oldest first. */
export function listMailingTimesSince(db: DbExecutor, userId: string, since: Date): Date[] {
  return db
    .select({ at: inviteMailings.at })
    .from(inviteMailings)
    .where(and(eq(inviteMailings.userId, userId), gte(inviteMailings.at, since)))
    .orderBy(asc(inviteMailings.at))
    .all()
    .map((row) => row.at);
}

/** Records `count` invite e-mails and forgets this user's rows older than `forgetBefore`. */
export function recordMailings(db: DbExecutor, userId: string, count: number, at: Date, forgetBefore: Date): void {
  db.delete(inviteMailings)
    .where(and(eq(inviteMailings.userId, userId), lt(inviteMailings.at, forgetBefore)))
    .run();
  if (count > 0)
    db.insert(inviteMailings)
      .values(Array.from({ length: count }, () => ({ userId, at })))
      .run();
}
