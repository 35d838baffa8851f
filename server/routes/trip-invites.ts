import type { Response } from 'express';
import { Router } from 'express';
import type { Db } from '@/db/client';
import {
  findTripInvite,
  insertTripInvite,
  listPendingTripInvites,
  setTripInviteMailFailed,
} from '@/db/queries/invites';
import { listMembers } from '@/db/queries/members';
import { findTrip, logActivity } from '@/db/queries/trips';
import { tripInvites, type TripInviteRow } from '@/db/schema/invites';
import { can, ROLE_RANK } from '@/shared/schemas/roles';
import { createInviteRequestSchema, type PendingInvite } from '@/shared/schemas/sharing';
import { HttpError, notFound, unprocessable } from '../errors';
import { claimInviteMailings, mailFailed } from '../invite-mail';
import { INVITE_LIFETIME_MS, isoDay, newInviteToken } from '../invite-tokens';
import type { Mailer } from '../mail/mailer';
import { tripInviteMail } from '../mail/templates';
import { currentUser } from '../middleware/require-session';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';
import { eq } from 'drizzle-orm';

type Deps = { db: Db; now: () => Date; mailer: Mailer; publicUrl: string; invitesPerHour: number };

export const inviteLink = (publicUrl: string, token: string) => `${publicUrl}/invites/${token}`;

const inviteBody = (invite: TripInviteRow) => ({
  id: invite.id,
  email: invite.email,
  role: invite.role,
  expiresAt: invite.expiresAt.toISOString(),
});

/** Invites to one trip: planners invite crew and viewers, owners also planners; owners resend and revoke. */
export function tripInvitesRouter({ db, now, mailer, publicUrl, invitesPerHour }: Deps): Router {
  const router = Router({ mergeParams: true });

  /**
   * E-mails the invite's link. When the mail does not go out the invite stays, marked as not sent,
   * and the client hears so at once (502) instead of waiting on a dead mail server.
   */
  async function mailInvite(res: Response, invite: TripInviteRow, token: string, message?: string): Promise<void> {
    const trip = findTrip(db, invite.tripId);
    if (!trip) throw notFound('That trip was not found.');
    try {
      await mailer.send(
        tripInviteMail({
          to: invite.email,
          inviterName: currentUser(res).name,
          tripName: trip.name,
          role: invite.role,
          ...(message ? { message } : {}),
          url: inviteLink(publicUrl, token),
          expiresOn: isoDay(invite.expiresAt),
        }),
      );
    } catch (error) {
      setTripInviteMailFailed(db, invite.id, now());
      throw mailFailed(error, `The invite to ${invite.email} is saved but its e-mail was not sent.`, {
        invite: { ...inviteBody(invite), mailFailed: true },
      });
    }
    if (invite.mailFailedAt) setTripInviteMailFailed(db, invite.id, null);
  }

  router.get('/', requirePermission('editTrip'), (_req, res) => {
    const { tripId, userId } = tripAccess(res);
    const invites: PendingInvite[] = listPendingTripInvites(db, tripId, now()).map(({ invite, invitedByName }) => ({
      id: invite.id,
      email: invite.email,
      role: invite.role,
      invitedByName,
      sentByMe: invite.invitedBy === userId,
      createdAt: invite.createdAt.toISOString(),
      expiresAt: invite.expiresAt.toISOString(),
      mailFailed: invite.mailFailedAt !== null,
    }));
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
    const at = now();
    const { token, hash } = newInviteToken();
    const invite = db.transaction((tx) => {
      claimInviteMailings(tx, res, { userId, count: 1, at, perHour: invitesPerHour });
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
      logActivity(tx, { tripId, userId, summary: `invited ${email} as ${body.role}`, at, audience: 'members' });
      return row;
    });
    await mailInvite(res, invite, token, body.message);
    res.status(201).json({ invite: inviteBody(invite) });
  });

  // "Resend", or "Retry" for an invite whose e-mail did not go out: the owner for any invite, a
  // planner for their own.
  router.post('/:inviteId/resend', requirePermission('editTrip'), async (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const invite = findTripInvite(db, tripId, idParam.parse(req.params.inviteId));
    if (!invite || invite.acceptedAt || invite.revokedAt) throw notFound('That invite is no longer pending.');
    if (!can(role, 'manageMembers') && invite.invitedBy !== userId)
      throw new HttpError(403, 'forbidden', 'Only the owner or the person who sent an invite can send it again.');
    // A fresh token: the old link stops working, and the week starts again.
    const { token, hash } = newInviteToken();
    const at = now();
    const expiresAt = new Date(at.getTime() + INVITE_LIFETIME_MS);
    db.transaction((tx) => {
      claimInviteMailings(tx, res, { userId, count: 1, at, perHour: invitesPerHour });
      tx.update(tripInvites).set({ tokenHash: hash, expiresAt }).where(eq(tripInvites.id, invite.id)).run();
      logActivity(tx, { tripId, userId, summary: `sent the invite to ${invite.email} again`, at, audience: 'members' });
    });
    const renewed = { ...invite, tokenHash: hash, expiresAt };
    await mailInvite(res, renewed, token, invite.message ?? undefined);
    res.json({ invite: inviteBody(renewed) });
  });

  router.delete('/:inviteId', requirePermission('manageMembers'), (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const invite = findTripInvite(db, tripId, idParam.parse(req.params.inviteId));
    if (!invite || invite.acceptedAt || invite.revokedAt) throw notFound('That invite is no longer pending.');
    db.transaction((tx) => {
      tx.update(tripInvites).set({ revokedAt: now() }).where(eq(tripInvites.id, invite.id)).run();
      logActivity(tx, {
        tripId,
        userId,
        summary: `withdrew the invite to ${invite.email}`,
        at: now(),
        audience: 'members',
      });
    });
    res.status(204).end();
  });

  return router;
}
