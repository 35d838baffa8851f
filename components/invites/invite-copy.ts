import type { InvitePreview } from '@/shared/schemas/sharing';

type Status = InvitePreview['status'];

/** What each refusal means and what the invitee can do about it. */
export const STATUS_COPY: Record<Exclude<Status, 'valid'>, { title: string; body: string }> = {
  expired: {
    title: 'This invite has expired',
    body: 'Invite links work for 7 days. Ask the person who invited you to send a fresh one.',
  },
  used: {
    title: 'This invite has already been used',
    body: 'Each link works once. If you already joined with it, it is in your lists in Trailtally; otherwise ask for a new invite.',
  },
  revoked: {
    title: 'This invite was withdrawn',
    body: 'The person who sent it cancelled it. Ask them for a new invite if you still need to join.',
  },
};

export const INVALID_COPY = {
  title: 'This invite link does not work',
  body: 'It may be incomplete: copy the whole link from the e-mail, or ask the person who invited you to send it again.',
};

export function whatFor(invite: InvitePreview): string {
  const by = invite.invitedByName ? `${invite.invitedByName} invited you` : 'You are invited';
  if (invite.kind === 'club') return `${by} to join the club ${invite.name}.`;
  return `${by} to the trip ${invite.name} as ${invite.role.charAt(0).toUpperCase()}${invite.role.slice(1)}.`;
}
