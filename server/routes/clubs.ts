import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import {
  countCopies,
  countOrganisedClubs,
  findClubRole,
  findMyCopy,
  listClubMembers,
  listClubsForUser,
  listClubTrips,
  listPendingClubInvites,
} from '@/db/queries/clubs';
import { findMembership } from '@/db/queries/trips';
import { user } from '@/db/schema/auth';
import { clubInvites, clubMembers, clubs, clubTrips } from '@/db/schema/clubs';
import { can } from '@/shared/schemas/roles';
import {
  clubInviteRequestSchema,
  createClubRequestSchema,
  shareTripRequestSchema,
  type ClubDetail,
  type ClubInviteReport,
} from '@/shared/schemas/sharing';
import { parseRecipients } from '../address-list';
import { LIMITS } from '@/shared/schemas/limits';
import { HttpError, limitReached, notFound } from '../errors';
import { INVITE_LIFETIME_MS, isoDay, newInviteToken } from '../invite-tokens';
import type { Mailer } from '../mail/mailer';
import { clubInviteMail } from '../mail/templates';
import { currentUser } from '../middleware/require-session';
import { idParam } from '../middleware/trip-access';

type Deps = { db: Db; now: () => Date; mailer: Mailer; publicUrl: string };

/** Mail goes out a few at a time: fast for a club of dozens, gentle on a provider's rate limits. */
const SEND_CONCURRENCY = 4;

function clubRoleOrThrow(db: Db, clubId: string, userId: string) {
  const role = findClubRole(db, clubId, userId);
  // Not a member: the club's existence does not leak.
  if (!role) throw notFound('That club was not found.');
  return role;
}

function organiserOrThrow(db: Db, clubId: string, userId: string): void {
  if (clubRoleOrThrow(db, clubId, userId) !== 'organiser')
    throw new HttpError(403, 'forbidden', 'Only the club organiser can do that.');
}

export function clubsRouter({ db, now, mailer, publicUrl }: Deps): Router {
  const router = Router();

  router.get('/', (_req, res) => {
    res.json({ clubs: listClubsForUser(db, currentUser(res).id) });
  });

  router.post('/', (req, res) => {
    const me = currentUser(res);
    const { name } = createClubRequestSchema.parse(req.body);
    const id = crypto.randomUUID();
    db.transaction((tx) => {
      if (countOrganisedClubs(tx, me.id) >= LIMITS.clubsPerUser)
        throw limitReached('clubs', `You can organise at most ${LIMITS.clubsPerUser} clubs.`);
      tx.insert(clubs).values({ id, name, createdBy: me.id, createdAt: now() }).run();
      tx.insert(clubMembers).values({ clubId: id, userId: me.id, role: 'organiser', joinedAt: now() }).run();
    });
    res.status(201).json({ club: { id, name, role: 'organiser', memberCount: 1, sharedTripCount: 0 } });
  });

  router.get('/:clubId', (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    const role = clubRoleOrThrow(db, clubId, me.id);
    const club = db.select().from(clubs).where(eq(clubs.id, clubId)).get();
    if (!club) throw notFound('That club was not found.');
    const members = listClubMembers(db, clubId);
    const trips = listClubTrips(db, clubId);
    const detail: ClubDetail = {
      club: { id: club.id, name: club.name, role, memberCount: members.length, sharedTripCount: trips.length },
      members,
      pendingInvites:
        role === 'organiser'
          ? listPendingClubInvites(db, clubId, now()).map((invite) => ({
              id: invite.id,
              email: invite.email,
              name: invite.name,
              expiresAt: invite.expiresAt.toISOString(),
            }))
          : [],
      trips: trips.map((trip) => ({
        ...trip,
        copies: countCopies(db, trip.tripId),
        myCopyTripId: findMyCopy(db, trip.tripId, me.id),
      })),
    };
    res.json(detail);
  });

  router.post('/:clubId/invites', async (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    const club = db.select().from(clubs).where(eq(clubs.id, clubId)).get();
    if (!club) throw notFound('That club was not found.');
    const { recipients, rejected } = parseRecipients(clubInviteRequestSchema.parse(req.body));
    const memberEmails = new Set(
      db
        .select({ email: user.email })
        .from(clubMembers)
        .innerJoin(user, eq(user.id, clubMembers.userId))
        .where(eq(clubMembers.clubId, clubId))
        .all()
        .map((row) => row.email.toLowerCase()),
    );
    const fresh = recipients.filter((recipient) => !memberEmails.has(recipient.email));
    const at = now();
    const expiresAt = new Date(at.getTime() + INVITE_LIFETIME_MS);
    const letters = db.transaction((tx) =>
      fresh.map((recipient) => {
        const { token, hash } = newInviteToken();
        tx.insert(clubInvites)
          .values({
            id: crypto.randomUUID(),
            clubId,
            email: recipient.email,
            name: recipient.name,
            tokenHash: hash,
            invitedBy: me.id,
            createdAt: at,
            expiresAt,
          })
          .run();
        return clubInviteMail({
          to: recipient.email,
          ...(recipient.name ? { name: recipient.name } : {}),
          inviterName: me.name,
          clubName: club.name,
          url: `${publicUrl}/club-invites/${token}`,
          expiresOn: isoDay(expiresAt),
        });
      }),
    );
    const sent: ClubInviteReport['sent'] = [];
    for (let i = 0; i < letters.length; i += SEND_CONCURRENCY) {
      const batch = letters.slice(i, i + SEND_CONCURRENCY);
      const results = await Promise.allSettled(batch.map((letter) => mailer.send(letter)));
      results.forEach((result, j) => {
        const recipient = fresh[i + j];
        if (!recipient) return;
        if (result.status === 'fulfilled') sent.push({ email: recipient.email, name: recipient.name });
        else rejected.push({ line: 0, value: recipient.email, reason: 'The mail server refused this address.' });
      });
    }
    const alreadyMembers = recipients.length - fresh.length;
    const report: ClubInviteReport & { alreadyMembers: number } = { sent, rejected, alreadyMembers };
    res.status(201).json(report);
  });

  router.delete('/:clubId/invites/:inviteId', (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    const result = db
      .update(clubInvites)
      .set({ revokedAt: now() })
      .where(and(eq(clubInvites.clubId, clubId), eq(clubInvites.id, idParam.parse(req.params.inviteId))))
      .run();
    if (result.changes === 0) throw notFound('That invite was not found.');
    res.status(204).end();
  });

  router.post('/:clubId/trips', (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    const { tripId } = shareTripRequestSchema.parse(req.body);
    const membership = findMembership(db, tripId, me.id);
    if (!membership) throw notFound('That trip was not found.');
    if (!can(membership.role, 'editTrip'))
      throw new HttpError(403, 'forbidden', 'Only the trip’s owner or a planner can share it to a club.');
    db.insert(clubTrips).values({ clubId, tripId, sharedBy: me.id, sharedAt: now() }).onConflictDoNothing().run();
    res.status(201).json({ trips: listClubTrips(db, clubId) });
  });

  router.delete('/:clubId/trips/:tripId', (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    db.delete(clubTrips)
      .where(and(eq(clubTrips.clubId, clubId), eq(clubTrips.tripId, idParam.parse(req.params.tripId))))
      .run();
    res.status(204).end();
  });

  return router;
}
