import { describe, expect, it } from 'vitest';
import { INVALID_COPY, STATUS_COPY, whatFor } from '@/components/invites/invite-copy';
import { linkTarget } from '@/components/outbox/link-target';
import { grantableRoles } from '@/components/people/grantable-roles';
import type { Role } from '@/shared/schemas/roles';
import type { InvitePreview } from '@/shared/schemas/sharing';

describe('grantableRoles', () => {
  it.each<[Role, string[]]>([
    ['owner', ['planner', 'crew', 'viewer']],
    ['planner', ['crew', 'viewer']],
    ['crew', ['viewer']],
    ['viewer', []],
  ])('when the caller is %s, then the invite form offers %j', (role, expected) => {
    expect(grantableRoles(role)).toEqual(expected);
  });
});

describe('linkTarget', () => {
  const origin = 'http://127.0.0.1:8124';
  it.each([
    ['an invite link to this app', `${origin}/invites/abc`, '/invites/abc'],
    ['a club invite with a query', `${origin}/club-invites/x?y=1`, '/club-invites/x?y=1'],
    [
      'an API step that redirects',
      `${origin}/api/auth/reset-password/t?callbackURL=x`,
      `${origin}/api/auth/reset-password/t?callbackURL=x`,
    ],
    ['another site', 'https://example.test/page', 'https://example.test/page'],
    ['a look-alike host', `${origin}.evil.test/invites/abc`, `${origin}.evil.test/invites/abc`],
  ])('when the mail holds %s, then it goes to %s', (_what, url, expected) => {
    expect(linkTarget(url, origin)).toBe(expected);
  });
});

describe('invite page copy', () => {
  const base: InvitePreview = {
    kind: 'trip',
    name: 'Highland loop',
    role: 'crew',
    email: 'a@example.test',
    invitedByName: 'Morag',
    status: 'valid',
    expiresAt: '2027-01-01T00:00:00Z',
  };

  it('when a trip invite names its sender, then the page says who invited whom to what, with the role', () => {
    expect(whatFor(base)).toBe('Morag invited you to the trip Highland loop as Crew.');
  });

  it('when a club invite has no sender name, then the page still says what it is for', () => {
    expect(whatFor({ ...base, kind: 'club', name: 'Firth Caravan Club', invitedByName: null })).toBe(
      'You are invited to join the club Firth Caravan Club.',
    );
  });

  it('when a link is refused, then every status tells the invitee what to do next', () => {
    for (const copy of [...Object.values(STATUS_COPY), INVALID_COPY])
      expect(copy.body).toMatch(/ask|sign in|copy the whole link/i);
  });
});
