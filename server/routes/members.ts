import { Router } from 'express';
import type { Db } from '@/db/client';
import { endSharesMadeBy } from '@/db/queries/clubs';
import { revokePendingTripInvitesTo } from '@/db/queries/invites';
import { listMembers, removeMember, setMemberRole } from '@/db/queries/members';
import { findTrip, logActivity, touchTrip } from '@/db/queries/trips';
import { updateMemberRoleRequestSchema } from '@/shared/schemas/api';
import { handOverRequestSchema } from '@/shared/schemas/sharing';
import { trips } from '@/db/schema/trips';
import { eq } from 'drizzle-orm';
import { findMembership } from '@/db/queries/trips';
import { HttpError, notFound } from '../errors';
import { requirePermission, tripAccess } from '../middleware/trip-access';

export function membersRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  router.get('/', (_req, res) => {
    const { tripId, viaClub } = tripAccess(res);
    const members = listMembers(db, tripId);
    // Someone who reads the trip through a club sees who plans it, not how to reach them.
    res.json({ members: viaClub ? members.map(({ email: _email, ...member }) => member) : members });
  });

  // Hand the trip to another member: they become owner, the previous owner stays on as planner.
  router.post('/hand-over', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { userId: target } = handOverRequestSchema.parse(req.body);
    if (target === userId)
      throw new HttpError(422, 'unprocessable', 'You already own this trip.', { userId: ['Choose another member.'] });
    db.transaction((tx) => {
      if (!findMembership(tx, tripId, target)) throw notFound('That member was not found.');
      setMemberRole(tx, tripId, target, 'owner');
      setMemberRole(tx, tripId, userId, 'planner');
      tx.update(trips).set({ ownerId: target }).where(eq(trips.id, tripId)).run();
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: 'handed ownership to another member', at: now() });
    });
    res.json({ members: listMembers(db, tripId) });
  });

  router.patch('/:userId', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const target = String(req.params.userId);
    const { role } = updateMemberRoleRequestSchema.parse(req.body);
    // Ownership moves only by an explicit hand-over, never by editing a role.
    if (role === 'owner' || target === findTrip(db, tripId)?.ownerId) {
      throw new HttpError(
        422,
        'unprocessable',
        "The owner's role cannot be changed here; hand over ownership instead.",
        { role: ['Not allowed.'] },
      );
    }
    db.transaction((tx) => {
      if (!setMemberRole(tx, tripId, target, role)) throw notFound('That member was not found.');
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `made a member ${role}`, at: now() });
    });
    res.json({ members: listMembers(db, tripId) });
  });

  router.delete('/:userId', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const target = String(req.params.userId);
    if (target === findTrip(db, tripId)?.ownerId) {
      throw new HttpError(422, 'unprocessable', 'The owner cannot be removed; hand over ownership first.');
    }
    const email = listMembers(db, tripId).find((member) => member.userId === target)?.email;
    // Removal takes away every way back in: the membership, links already sent to their address,
    // and the clubs they shared the trip to.
    db.transaction((tx) => {
      if (!email || !removeMember(tx, tripId, target)) throw notFound('That member was not found.');
      revokePendingTripInvitesTo(tx, tripId, email, now());
      endSharesMadeBy(tx, tripId, target);
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: 'removed a member', at: now() });
    });
    res.status(204).end();
  });

  return router;
}
