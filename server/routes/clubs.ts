import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import {
  countCopies,
  countOrganisedClubs,
  findClubRole,
  findMyCopy,
  findPendingClubInvite,
  listClubMemberEmails,
  listClubMembers,
  listClubsForUser,
  listClubTrips,
  listPendingClubInvites,
  setClubInvitesMailFailed,
} from '@/db/queries/clubs';
import { logActivity } from '@/db/queries/trips';
import { clubInvites, clubMembers, clubs, clubTrips } from '@/db/schema/clubs';
import { can } from '@/shared/schemas/roles';
import {
  clubInviteRequestSchema,
  createClubRequestSchema,
  MAX_CLUB_INVITES_PER_REQUEST,
  shareTripRequestSchema,
  type ClubDetail,
  type ClubInviteReport,
} from '@/shared/schemas/sharing';
import { parseRecipients } from '../address-list';
import { LIMITS } from '@/shared/schemas/limits';
import { HttpError, limitReached, notFound } from '../errors';
import { claimInviteMailings, deliverAll, mailFailed } from '../invite-mail';
import { INVITE_LIFETIME_MS, isoDay, newInviteToken } from '../invite-tokens';
import { MailSendError, type Mailer } from '../mail/mailer';
import { clubInviteMail } from '../mail/templates';
import { currentUser } from '../middleware/require-session';
import { idParam, resolveAccess } from '../middleware/trip-access';

type Deps = { db: Db; now: () => Date; mailer: Mailer; publicUrl: string; invitesPerHour: number };

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

export function clubsRouter({ db, now, mailer, publicUrl, invitesPerHour: perHour }: Deps): Router {
  const router = Router();

  const letter = (
    to: { email: string; name: string | null },
    inviterName: string,
    clubName: string,
    token: string,
    expiresAt: Date,
  ) =>
    clubInviteMail({
      to: to.email,
      ...(to.name ? { name: to.name } : {}),
      inviterName,
      clubName,
      url: `${publicUrl}/club-invites/${token}`,
      expiresOn: isoDay(expiresAt),
    });

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
              mailFailed: invite.mailFailedAt !== null,
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
    const { recipients, rejected, sources } = parseRecipients(clubInviteRequestSchema.parse(req.body));
    if (recipients.length > MAX_CLUB_INVITES_PER_REQUEST) {
      const message = `At most ${MAX_CLUB_INVITES_PER_REQUEST} addresses per request; this one has ${recipients.length}. Send the rest in another batch.`;
      throw new HttpError(
        400,
        'validation_failed',
        message,
        Object.fromEntries(sources.map((field) => [field, [message]])),
      );
    }
    const at = now();
    // Nobody is mailed twice: members are already in, and a waiting invite keeps its link.
    const memberEmails = listClubMemberEmails(db, clubId);
    const pending = new Map(
      listPendingClubInvites(
        db,
        clubId,
        at,
        recipients.map((r) => r.email),
      ).map((invite) => [invite.email, invite]),
    );
    const skipped: ClubInviteReport['skipped'] = [];
    const fresh = recipients.filter((recipient) => {
      const waiting = pending.get(recipient.email);
      if (memberEmails.has(recipient.email))
        skipped.push({ line: recipient.line, email: recipient.email, why: 'member', reason: 'Already in the club.' });
      else if (waiting)
        skipped.push({
          line: recipient.line,
          email: recipient.email,
          why: 'pending',
          reason: waiting.mailFailedAt
            ? 'An invite is waiting but its e-mail was not sent: use Retry under “Waiting to join”.'
            : `Already invited; the link works until ${isoDay(waiting.expiresAt)}, so it was not sent again.`,
        });
      else return true;
      return false;
    });
    const expiresAt = new Date(at.getTime() + INVITE_LIFETIME_MS);
    const letters = db.transaction((tx) => {
      if (fresh.length > 0) claimInviteMailings(tx, res, { userId: me.id, count: fresh.length, at, perHour });
      return fresh.map((recipient) => {
        const { token, hash } = newInviteToken();
        const id = crypto.randomUUID();
        tx.insert(clubInvites)
          .values({
            id,
            clubId,
            email: recipient.email,
            name: recipient.name,
            tokenHash: hash,
            invitedBy: me.id,
            createdAt: at,
            expiresAt,
          })
          .run();
        return { item: { id, recipient }, message: letter(recipient, me.name, club.name, token, expiresAt) };
      });
    });
    const delivery = await deliverAll(mailer, letters);
    setClubInvitesMailFailed(
      db,
      delivery.failed.map(({ item }) => item.id),
      now(),
    );
    const report: ClubInviteReport = {
      sent: delivery.sent.map(({ recipient }) => ({ email: recipient.email, name: recipient.name })),
      rejected,
      skipped,
      failed: delivery.failed.map(({ item, reason }) => ({
        email: item.recipient.email,
        name: item.recipient.name,
        reason,
      })),
    };
    if (delivery.serverDown)
      throw mailFailed(
        new MailSendError('transport', delivery.failed[0]?.reason ?? 'The mail server could not be reached.'),
        `${delivery.failed.length} of the invites are saved but their e-mails were not sent.`,
        { report },
      );
    res.status(201).json(report);
  });

  // Retry (or resend) one club invite: a fresh link for another week.
  router.post('/:clubId/invites/:inviteId/resend', async (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    const club = db.select().from(clubs).where(eq(clubs.id, clubId)).get();
    const at = now();
    const invite = findPendingClubInvite(db, clubId, idParam.parse(req.params.inviteId), at);
    if (!club || !invite) throw notFound('That invite is no longer pending.');
    const { token, hash } = newInviteToken();
    const expiresAt = new Date(at.getTime() + INVITE_LIFETIME_MS);
    db.transaction((tx) => {
      claimInviteMailings(tx, res, { userId: me.id, count: 1, at, perHour });
      tx.update(clubInvites).set({ tokenHash: hash, expiresAt }).where(eq(clubInvites.id, invite.id)).run();
    });
    try {
      await mailer.send(letter(invite, me.name, club.name, token, expiresAt));
    } catch (error) {
      setClubInvitesMailFailed(db, [invite.id], now());
      throw mailFailed(error, `The invite to ${invite.email} was not sent.`);
    }
    setClubInvitesMailFailed(db, [invite.id], null);
    res.json({ invite: { id: invite.id, email: invite.email, expiresAt: expiresAt.toISOString(), mailFailed: false } });
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
    const access = resolveAccess(db, tripId, me.id);
    if (!access) throw notFound('That trip was not found.');
    // Sharing widens who reads the trip, so it is the owner's call alone (as inviting a planner is);
    // the owner also sees every share on the People tab and can withdraw it.
    if (!can(access.role, 'manageMembers'))
      throw new HttpError(403, 'forbidden', 'Only the trip’s owner can share it to a club.');
    const club = db.select({ name: clubs.name }).from(clubs).where(eq(clubs.id, clubId)).get();
    db.transaction((tx) => {
      const added = tx
        .insert(clubTrips)
        .values({ clubId, tripId, sharedBy: me.id, sharedAt: now() })
        .onConflictDoNothing()
        .run();
      if (added.changes > 0)
        logActivity(tx, {
          tripId,
          userId: me.id,
          summary: `shared the trip with the club "${club?.name ?? ''}"`,
          at: now(),
          audience: 'members',
        });
    });
    res.status(201).json({ trips: listClubTrips(db, clubId) });
  });

  router.delete('/:clubId/trips/:tripId', (req, res) => {
    const me = currentUser(res);
    const clubId = idParam.parse(req.params.clubId);
    organiserOrThrow(db, clubId, me.id);
    const tripId = idParam.parse(req.params.tripId);
    const club = db.select({ name: clubs.name }).from(clubs).where(eq(clubs.id, clubId)).get();
    db.transaction((tx) => {
      const removed = tx
        .delete(clubTrips)
        .where(and(eq(clubTrips.clubId, clubId), eq(clubTrips.tripId, tripId)))
        .run();
      if (removed.changes > 0)
        logActivity(tx, {
          tripId,
          userId: me.id,
          summary: `stopped sharing the trip with the club "${club?.name ?? ''}"`,
          at: now(),
          audience: 'members',
        });
    });
    res.status(204).end();
  });

  return router;
}
