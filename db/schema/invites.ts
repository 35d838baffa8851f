import { index, integer, sqliteTable, text } from 'drizzle-orm/sqlite-core';
import { user } from './auth';
import { trips } from './trips';

/**
 * An e-mailed invitation to a trip. Only a SHA-256 hash of the token is stored, so a leaked
 * database cannot be turned into working links; the token itself exists only in the e-mail.
 */
export const tripInvites = sqliteTable(
  'trip_invites',
  {
    id: text('id').primaryKey(),
    tripId: text('trip_id')
      .notNull()
      .references(() => trips.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: ['planner', 'crew', 'viewer'] }).notNull(),
    message: text('message'),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: integer('created_at', { mode: 'timestamp_ms' }).notNull(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    acceptedBy: text('accepted_by').references(() => user.id, { onDelete: 'set null' }),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
    /** Set when the e-mail could not be sent; the invite stays, shown as "not sent" until a retry gets through. */
    mailFailedAt: integer('mail_failed_at', { mode: 'timestamp_ms' }),
  },
  (table) => [index('trip_invites_trip_idx').on(table.tripId)],
);

export type TripInviteRow = typeof tripInvites.$inferSelect;

/**
 * One row per invite e-mail a user asked for (trip or club, first send or resend), so the hourly
 * cap per user holds across both kinds of invite and across restarts.
 */
export const inviteMailings = sqliteTable(
  'invite_mailings',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    at: integer('at', { mode: 'timestamp_ms' }).notNull(),
  },
  (table) => [index('invite_mailings_user_at_idx').on(table.userId, table.at)],
);
