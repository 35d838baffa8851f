import { Router } from 'express';
import type { Db } from '@/db/client';
import { deleteTripShare, listTripShares } from '@/db/queries/clubs';
import { logActivity } from '@/db/queries/trips';
import type { TripShare } from '@/shared/schemas/sharing';
import { notFound } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';

/**
 * The clubs a trip is shared with, seen from the trip: owners and planners see every one, whoever
 * shared it, and the owner can withdraw any of them.
 */
export function tripSharesRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.get('/', requirePermission('editTrip'), (_req, res) => {
    const shares: TripShare[] = listTripShares(db, tripAccess(res).tripId);
    res.json({ shares });
  });

  router.delete('/:clubId', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const clubId = idParam.parse(req.params.clubId);
    const club = listTripShares(db, tripId).find((share) => share.clubId === clubId);
    db.transaction((tx) => {
      if (!club || !deleteTripShare(tx, tripId, clubId)) throw notFound('This trip is not shared with that club.');
      logActivity(tx, {
        tripId,
        userId,
        summary: `stopped sharing the trip with the club "${club.clubName}"`,
        at: now(),
        audience: 'members',
      });
    });
    res.status(204).end();
  });

  return router;
}
