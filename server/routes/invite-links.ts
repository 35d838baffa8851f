import { eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import { findInviteByHash } from '@/db/queries/invites';
import { addMember } from '@/db/queries/members';
import { findMembership, findTrip, logActivity, touchTrip } from '@/db/queries/trips';
import { user } from '@/db/schema/auth';
import { tripInvites } from '@/db/schema/invites';
import { ROLE_RANK } from '@/shared/schemas/roles';
import type { InvitePreview } from '@/shared/schemas/sharing';
import type { Auth } from '../auth';
import { HttpError } from '../errors';
import {
  assertUsable,
  hashInviteToken,
  invalidInvite,
  inviteStatus,
  maskEmail,
  parseInviteToken,
} from '../invite-tokens';
import { currentUser, requireSession } from '../middleware/require-session';

/**
 * The link in a trip invite. Anyone holding it may see what it is for; joining needs a session
 * whose e-mail is the invited one (the rule: an invite belongs to an address, not to whoever
 * holds the link), and works once.
 */
export function inviteLinksRouter({ db, now, auth }: { db: Db; now: () => Date; auth: Auth }): Router {
  const router = Router();

  router.get('/:token', (req, res) => {
    const invite = findInviteByHash(db, hashInviteToken(parseInviteToken(req.params.token)));
    const trip = invite ? findTrip(db, invite.tripId) : undefined;
    if (!invite || !trip) throw invalidInvite();
    const inviter = invite.invitedBy
      ? db.select({ name: user.name }).from(user).where(eq(user.id, invite.invitedBy)).get()
      : undefined;
    const preview: InvitePreview = {
      kind: 'trip',
      name: trip.name,
      role: invite.role,
      email: invite.email,
      invitedByName: inviter?.name ?? null,
      status: inviteStatus(invite, now()),
      expiresAt: invite.expiresAt.toISOString(),
    };
    res.json({ invite: preview });
  });

  router.post('/:token/accept', requireSession(auth), (req, res) => {
    const me = currentUser(res);
    const tokenHash = hashInviteToken(parseInviteToken(req.params.token));
    const tripId = db.transaction((tx) => {
      const invite = findInviteByHash(tx, tokenHash);
      if (!invite) throw invalidInvite();
      assertUsable(invite, now());
      if (invite.email.toLowerCase() !== me.email.toLowerCase()) {
        throw new HttpError(
          403,
          'invite_wrong_account',
          `This invite was sent to ${maskEmail(invite.email)}. Sign in with that address to join.`,
        );
      }
      const existing = findMembership(tx, invite.tripId, me.id);
      // Joining never lowers a role someone already has.
      if (!existing || ROLE_RANK[existing.role] < ROLE_RANK[invite.role])
        addMember(tx, invite.tripId, me.id, invite.role, now());
      tx.update(tripInvites).set({ acceptedAt: now(), acceptedBy: me.id }).where(eq(tripInvites.id, invite.id)).run();
      touchTrip(tx, invite.tripId, now());
      logActivity(tx, { tripId: invite.tripId, userId: me.id, summary: `joined as ${invite.role}`, at: now() });
      return invite.tripId;
    });
    res.json({ tripId, role: findMembership(db, tripId, me.id)?.role });
  });

  return router;
}
