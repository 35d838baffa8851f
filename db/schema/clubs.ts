import { index, integer, primaryKey, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';
import { trips } from './trips';

export const clubs = sqliteTable('clubs', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  createdBy: text('created_by').references(() => user.id, { onDelete: 'set null' }),
  createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
});

export const clubMembers = sqliteTable(
  'club_members',
  {
    clubId: text('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ['organiser', 'member'] }).notNull(),
    joinedAt: integer('joined_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.clubId, table.userId] }), index('club_members_user_idx').on(table.userId)],
);

/** Like trip invites: the token is only in the e-mail, the database keeps its hash. */
export const clubInvites = sqliteTable(
  'club_invites',
  {
    id: text('id').primaryKey(),
    clubId: text('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    name: text('name'),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
    /** Set when the e-mail could not be sent; cleared when a retry gets through. */
    mailFailedAt: integer('mail_failed_at', { mode: 'timestamp_ms' }),
  },
  (table) => [index('club_invites_club_idx').on(table.clubId)],
);

/** A trip shared to a club: every club member may view it and copy it onto their own rig. */
export const clubTrips = sqliteTable(
  'club_trips',
  {
    clubId: text('club_id')
      .notNull()
      .references(() => clubs.id, { onDelete: 'cascade' }),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    sharedBy: text('shared_by').references(() => user.id, { onDelete: 'set null' }),
    sharedAt: integer('shared_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [primaryKey({ columns: [table.clubId, table.tripId] }), index('club_trips_trip_idx').on(table.tripId)],
);

/**
 * A member's copy of a shared trip ("based on the club's plan"). It remembers which version of
 * the original's route it was copied from, so the copy can say when the original's stops change.
 */
export const tripCopies = sqliteTable(
  'trip_copies',
  {
    copyTripId: text('copy_trip_id')
      .primaryKey()
      .references(() => trips.id, { onDelete: 'cascade' }),
    sourceTripId: text('source_trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    sourceRouteRevision: integer('source_route_revision').notNull(),
    copiedAt: integer('copied_at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [index('trip_copies_source_idx').on(table.sourceTripId)],
);
