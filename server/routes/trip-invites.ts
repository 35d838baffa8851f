import { eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import { findTripInvite, insertTripInvite, listPendingTripInvites } from '@/db/queries/invites';
import { listMembers } from '@/db/queries/members';
import { findTrip, logActivity } from '@/db/queries/trips';
import { tripInvites } from '@/db/schema/invites';
import { ROLE_RANK } from '@/shared/schemas/roles';
import { createInviteRequestSchema, type PendingInvite } from '@/shared/schemas/sharing';
import { HttpError, notFound, unprocessable } from '../errors';
import { INVITE_LIFETIME_MS, isoDay, newInviteToken } from '../invite-tokens';
import type { Mailer } from '../mail/mailer';
import { tripInviteMail } from '../mail/templates';
import { currentUser } from '../middleware/require-session';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';

type Deps = { db: Db; now: () => Date; mailer: Mailer; publicUrl: string };

export const inviteLink = (publicUrl: string, token: string) => `${publicUrl}/invites/${token}`;

/** Invites to one trip: planners invite crew and viewers, owners also planners; owners resend and revoke. */
export function tripInvitesRouter({ db, now, mailer, publicUrl }: Deps): Router {
  const router = Router({ mergeParams: true });

  router.get('/', requirePermission('editTrip'), (_req, res) => {
    const invites: PendingInvite[] = listPendingTripInvites(db, tripAccess(res).tripId, now()).map(
      ({ invite, invitedByName }) => ({
        id: invite.id,
        email: invite.email,
        role: invite.role,
        invitedByName,
        createdAt: invite.createdAt.toISOString(),
        expiresAt: invite.expiresAt.toISOString(),
      }),
    );
    res.json({ invites });
  });

  router.post('/', requirePermission('editTrip'), async (req, res) => {
    const { tripId, role: myRole, userId } = tripAccess(res);
    const body = createInviteRequestSchema.parse(req.body);
    // Nobody grants more than they hold, and planners hand out crew and viewer only.
    if (ROLE_RANK[body.role] >= ROLE_RANK[myRole]) {
      throw new HttpError(403, 'forbidden', `As ${myRole} you can invite crew and viewers, not a ${body.role}.`);
    }
    const email = body.email.toLowerCase();
    if (listMembers(db, tripId).some((member) => member.email.toLowerCase() === email)) {
      throw unprocessable('email', 'That person is already a member of this trip.');
    }
    const trip = findTrip(db, tripId);
    if (!trip) throw notFound('That trip was not found.');
    const at = now();
    const { token, hash } = newInviteToken();
    const invite = db.transaction((tx) => {
      const row = insertTripInvite(tx, {
        id: crypto.randomUUID(),
        tripId,
        email,
        role: body.role,
        message: body.message ?? null,
        tokenHash: hash,
        invitedBy: userId,
        createdAt: at,
        expiresAt: new Date(at.getTime() + INVITE_LIFETIME_MS),
      });
      logActivity(tx, { tripId, userId, summary: `invited ${email} as ${body.role}`, at });
      return row;
    });
    await mailer.send(
      tripInviteMail({
        to: email,
        inviterName: currentUser(res).name,
        tripName: trip.name,
        role: body.role,
        ...(body.message ? { message: body.message } : {}),
        url: inviteLink(publicUrl, token),
        expiresOn: isoDay(invite.expiresAt),
      }),
    );
    res
      .status(201)
      .json({ invite: { id: invite.id, email, role: invite.role, expiresAt: invite.expiresAt.toISOString() } });
  });

  router.post('/:inviteId/resend', requirePermission('manageMembers'), async (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const invite = findTripInvite(db, tripId, idParam.parse(req.params.inviteId));
    if (!invite || invite.acceptedAt || invite.revokedAt) throw notFound('That invite is no longer pending.');
    const trip = findTrip(db, tripId);
    if (!trip) throw notFound('That trip was not found.');
    // A fresh token: the old link stops working, and the week starts again.
    const { token, hash } = newInviteToken();
    const expiresAt = new Date(now().getTime() + INVITE_LIFETIME_MS);
    db.update(tripInvites).set({ tokenHash: hash, expiresAt }).where(eq(tripInvites.id, invite.id)).run();
    logActivity(db, { tripId, userId, summary: `sent the invite to ${invite.email} again`, at: now() });
    await mailer.send(
      tripInviteMail({
        to: invite.email,
        inviterName: currentUser(res).name,
        tripName: trip.name,
        role: invite.role,
        url: inviteLink(publicUrl, token),
        expiresOn: isoDay(expiresAt),
      }),
    );
    res.json({ invite: { id: invite.id, email: invite.email, role: invite.role, expiresAt: expiresAt.toISOString() } });
  });

  router.delete('/:inviteId', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const invite = findTripInvite(db, tripId, idParam.parse(req.params.inviteId));
    if (!invite || invite.acceptedAt || invite.revokedAt) throw notFound('That invite is no longer pending.');
    db.update(tripInvites).set({ revokedAt: now() }).where(eq(tripInvites.id, invite.id)).run();
    logActivity(db, { tripId, userId, summary: `withdrew the invite to ${invite.email}`, at: now() });
    res.status(204).end();
  });

  return router;
}
