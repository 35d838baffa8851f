// Contracts for sharing: trip invites, clubs, and copies of a club's trip onto a member's rig.
import { z } from 'zod';
import { LIMITS } from './limits';
import { nameText } from './text';

export const inviteRoleSchema = z.enum(['planner', 'crew', 'viewer'], {
  error: 'Invite as planner, crew or viewer; ownership is handed over separately.',
});
export type InviteRole = z.infer<typeof inviteRoleSchema>;

export const createInviteRequestSchema = z
  .object({
    email: z.email({ error: 'Enter an e-mail address like name@example.com.' }).max(254),
    role: inviteRoleSchema,
    message: z.string().trim().max(500, { error: 'Keep the note under 500 characters.' }).optional(),
  })
  .strict();
export type CreateInviteRequest = z.input<typeof createInviteRequestSchema>;

export const pendingInviteSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: inviteRoleSchema,
  invitedByName: z.string().nullable(),
  /** The caller sent it: a planner may retry their own invite, the owner any. */
  sentByMe: z.boolean(),
  createdAt: z.string(),
  expiresAt: z.string(),
  /** The e-mail could not be sent; the invite waits for a retry. */
  mailFailed: z.boolean(),
});
export type PendingInvite = z.infer<typeof pendingInviteSchema>;

export const inviteStatusSchema = z.enum(['valid', 'expired', 'used', 'revoked']);

/** What the invite page shows before the invitee joins. */
export const invitePreviewSchema = z.object({
  kind: z.enum(['trip', 'club']),
  name: z.string(),
  role: z.string(),
  email: z.string(),
  invitedByName: z.string().nullable(),
  status: inviteStatusSchema,
  expiresAt: z.string(),
});
export type InvitePreview = z.infer<typeof invitePreviewSchema>;

export const handOverRequestSchema = z.object({ userId: z.string().min(1).max(64) }).strict();

export const createClubRequestSchema = z.object({ name: nameText(120, { empty: 'Give the club a name.' }) }).strict();

/** Addresses one club-invite request may carry: a large club's mailing in a couple of batches, never a mass mailing. */
export const MAX_CLUB_INVITES_PER_REQUEST = 200;

/** Invite e-mails (trip and club, first sends and retries) one person may send in an hour. */
export const INVITES_PER_HOUR = 300;

/** Many households at once: pasted addresses ("Name <a@b>", commas or new lines) and/or a CSV of names and e-mails. */
export const clubInviteRequestSchema = z
  .object({
    addresses: z.string().max(50_000).optional(),
    csv: z.string().max(50_000).optional(),
  })
  .strict()
  .refine((body) => (body.addresses ?? '').trim() !== '' || (body.csv ?? '').trim() !== '', {
    message: 'Paste some addresses or choose a CSV file.',
    path: ['addresses'],
  });
export type ClubInviteRequest = z.input<typeof clubInviteRequestSchema>;

export const clubInviteReportSchema = z.object({
  sent: z.array(z.object({ email: z.string(), name: z.string().nullable() })),
  /** Rows that are not an e-mail address, by their line. */
  rejected: z.array(z.object({ line: z.number().int(), value: z.string(), reason: z.string() })),
  /** Good addresses left out on purpose: already in the club, or an invite to them is still waiting. */
  skipped: z.array(
    z.object({ line: z.number().int(), email: z.string(), why: z.enum(['member', 'pending']), reason: z.string() }),
  ),
  /** Invites saved but not e-mailed (the mail server refused or could not be reached): retry them from the list. */
  failed: z.array(z.object({ email: z.string(), name: z.string().nullable(), reason: z.string() })),
});
export type ClubInviteReport = z.infer<typeof clubInviteReportSchema>;

export const shareTripRequestSchema = z.object({ tripId: z.string().min(1).max(64) }).strict();

/**
 * The copy runs on one of My rigs and brings that rig's usual loads; of the plan's own appliances only those named in
 * sharedApplianceIds come along (a rally's shared lights, say), never the organiser's whole list.
 */
export const copyTripRequestSchema = z
  .object({
    rigId: z.string().min(1).max(64),
    name: nameText(120, { empty: 'Give the trip a name.' }).optional(),
    sharedApplianceIds: z.array(z.string().min(1).max(64)).max(LIMITS.appliancesPerTrip).default([]),
  })
  .strict();

export const clubSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  role: z.enum(['organiser', 'member']),
  memberCount: z.number().int(),
  sharedTripCount: z.number().int(),
});
export type ClubSummary = z.infer<typeof clubSummarySchema>;

export const clubSharedTripSchema = z.object({
  tripId: z.string(),
  name: z.string(),
  startDate: z.string(),
  endDate: z.string(),
  sharedByName: z.string().nullable(),
  /** Households that copied it onto their own rig; the organiser sees the count, never their data. */
  copies: z.number().int(),
  myCopyTripId: z.string().nullable(),
});

export const clubDetailSchema = z.object({
  club: clubSummarySchema,
  members: z.array(z.object({ userId: z.string(), name: z.string(), role: z.enum(['organiser', 'member']) })),
  pendingInvites: z.array(
    z.object({
      id: z.string(),
      email: z.string(),
      name: z.string().nullable(),
      expiresAt: z.string(),
      mailFailed: z.boolean(),
    }),
  ),
  trips: z.array(clubSharedTripSchema),
});
export type ClubDetail = z.infer<typeof clubDetailSchema>;

export const basedOnSchema = z.object({
  tripId: z.string(),
  name: z.string(),
  /** The original's stops or drives changed since this copy was made (or last acknowledged). */
  routeChanged: z.boolean(),
});
export type BasedOn = z.infer<typeof basedOnSchema>;

/** A club the trip is shared with, as its People tab lists it. */
export const tripShareSchema = z.object({
  clubId: z.string(),
  clubName: z.string(),
  sharedByName: z.string().nullable(),
  sharedAt: z.string(),
  memberCount: z.number().int(),
});
export type TripShare = z.infer<typeof tripShareSchema>;
