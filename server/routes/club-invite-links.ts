import { eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import { user } from '@/db/schema/auth';
import { clubInvites, clubMembers, clubs } from '@/db/schema/clubs';
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

/** The link in a club invite: the same rules as a trip invite (its address, once, for a week). */
export function clubInviteLinksRouter({ db, now, auth }: { db: Db; now: () => Date; auth: Auth }): Router {
  const router = Router();

  router.get('/:token', (req, res) => {
    const invite = db
      .select()
      .from(clubInvites)
      .where(eq(clubInvites.tokenHash, hashInviteToken(parseInviteToken(req.params.token))))
      .get();
    const club = invite ? db.select().from(clubs).where(eq(clubs.id, invite.clubId)).get() : undefined;
    if (!invite || !club) throw invalidInvite();
    const inviter = invite.invitedBy
      ? db.select({ name: user.name }).from(user).where(eq(user.id, invite.invitedBy)).get()
      : undefined;
    res.json({
      invite: {
        kind: 'club',
        name: club.name,
        role: 'member',
        email: invite.email,
        invitedByName: inviter?.name ?? null,
        status: inviteStatus(invite, now()),
        expiresAt: invite.expiresAt.toISOString(),
      },
    });
  });

  router.post('/:token/accept', requireSession(auth), (req, res) => {
    const me = currentUser(res);
    const clubId = db.transaction((tx) => {
      const invite = tx
        .select()
        .from(clubInvites)
        .where(eq(clubInvites.tokenHash, hashInviteToken(parseInviteToken(req.params.token))))
        .get();
      if (!invite) throw invalidInvite();
      assertUsable(invite, now());
      if (invite.email.toLowerCase() !== me.email.toLowerCase()) {
        throw new HttpError(
          403,
          'invite_wrong_account',
          `This invite was sent to ${maskEmail(invite.email)}. Sign in with that address to join.`,
        );
      }
      tx.insert(clubMembers)
        .values({ clubId: invite.clubId, userId: me.id, role: 'member', joinedAt: now() })
        .onConflictDoNothing()
        .run();
      tx.update(clubInvites).set({ acceptedAt: now() }).where(eq(clubInvites.id, invite.id)).run();
      return invite.clubId;
    });
    res.json({ clubId });
  });

  return router;
}
