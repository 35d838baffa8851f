import crypto from 'node:crypto';
import { HttpError } from './errors';

/** Invites last a week (product rule). */
export const INVITE_LIFETIME_MS = 7 * 24 * 60 * 60 * 1000;

/** 256 random bits, URL-safe: well past the 128-bit floor for unguessable links. */
export function newInviteToken(): { token: string; hash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, hash: hashInviteToken(token) };
}

export function hashInviteToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}

type InviteState = { expiresAt: Date; acceptedAt: Date | null; revokedAt: Date | null };

export function inviteStatus(invite: InviteState, now: Date): 'valid' | 'expired' | 'used' | 'revoked' {
  if (invite.revokedAt) return 'revoked';
  if (invite.acceptedAt) return 'used';
  if (invite.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'valid';
}

/** Refuses a link that cannot be used any more, with a message the invitee can act on. */
export function assertUsable(invite: InviteState, now: Date): void {
  const status = inviteStatus(invite, now);
  if (status === 'revoked') throw new HttpError(410, 'invite_revoked', 'This invite was withdrawn. Ask for a new one.');
  if (status === 'used')
    throw new HttpError(410, 'invite_used', 'This invite has already been used. Each link works once.');
  if (status === 'expired') throw new HttpError(410, 'invite_expired', 'This invite has expired. Ask for a new one.');
}

/** a•••@example.com: enough to recognise the address without printing all of it. */
export function maskEmail(email: string): string {
  const [local = '', domain = ''] = email.split('@');
  return `${local.slice(0, 1)}•••@${domain}`;
}

export const invalidInvite = () =>
  new HttpError(404, 'invite_invalid', 'This invite link is not valid. Check that it was copied whole.');

export const isoDay = (date: Date) => date.toISOString().slice(0, 10);

/** Tokens are 43 URL-safe characters; anything else is a tampered or truncated link. */
export function parseInviteToken(raw: unknown): string {
  if (typeof raw !== 'string' || !/^[A-Za-z0-9_-]{20,100}$/.test(raw)) throw invalidInvite();
  return raw;
}
