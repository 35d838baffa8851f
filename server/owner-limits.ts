// How much one person may keep: checked inside the transaction that adds one more, so two requests at once
// cannot both slip under the limit.
import type { DbExecutor } from '@/db/client';
import { countOwnedTrips, countSavedRigs } from '@/db/queries/owned-counts';
import { LIMITS } from '@/shared/schemas/limits';
import { limitReached } from './errors';

export function ensureRoomForTrip(tx: DbExecutor, ownerId: string): void {
  if (countOwnedTrips(tx, ownerId) >= LIMITS.tripsPerUser)
    throw limitReached('trips', `You can keep at most ${LIMITS.tripsPerUser} trips. Delete an old one first.`);
}

export function ensureRoomForSavedRig(tx: DbExecutor, ownerId: string): void {
  if (countSavedRigs(tx, ownerId) >= LIMITS.savedRigsPerUser)
    throw limitReached('rigs', `You can keep at most ${LIMITS.savedRigsPerUser} rigs. Delete one first.`);
}
