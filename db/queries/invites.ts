import { and, asc, eq, gt, isNull } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { user } from '../schema/auth';
import { tripInvites, type TripInviteRow } from '../schema/invites';

export function insertTripInvite(
  db: DbExecutor,
  values: Omit<TripInviteRow, 'acceptedAt' | 'acceptedBy' | 'revokedAt'>,
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
