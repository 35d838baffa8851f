import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { Card } from '@/components/ui/card';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import { useSession } from '@/stores/auth-client';
import { useTripMembersQuery } from '@/stores/queries/members';
import { ActivityList } from './activity-list';
import { InviteForm } from './invite-form';
import { MemberRow } from './member-row';
import { PendingInvites } from './pending-invites';
import { TripClubShares } from './trip-club-shares';

const ROLE_NOTE = {
  owner: 'everything, including members and deleting the trip',
  planner: 'the route, the rig and the loads',
  crew: 'appliances and their routines',
  viewer: 'reads the plan, the budget and the cautions',
} as const;

function Heading({ children }: { children: string }) {
  return (
    <Text variant="title" role="heading" aria-level={2}>
      {children}
    </Text>
  );
}

/** Who is on the trip and what they may do; owners and planners invite, the owner manages. */
export function PeopleScreen({ detail }: { detail: TripDetail }) {
  const tripId = detail.trip.id;
  const myRole = detail.trip.role;
  const me = useSession().data?.user.id;
  const members = useTripMembersQuery(tripId);
  const canInvite = can(myRole, 'editTrip');
  const canManage = can(myRole, 'manageMembers');

  const main = (
    <>
      <Card testID="members">
        <Heading>People on this trip</Heading>
        {members.isPending ? <Skeleton testID="members-loading" height={96} /> : null}
        {members.isError ? (
          <QueryError testID="members-error" error={members.error} onRetry={() => void members.refetch()} />
        ) : null}
        {members.data?.members.map((m) => (
          <MemberRow key={m.userId} tripId={tripId} member={m} isMe={m.userId === me} canManage={canManage} />
        ))}
        <Text variant="caption" color="inkSoft">
          {ROLE_LABEL.owner}: {ROLE_NOTE.owner}. {ROLE_LABEL.planner}: {ROLE_NOTE.planner}. {ROLE_LABEL.crew}:{' '}
          {ROLE_NOTE.crew}. {ROLE_LABEL.viewer}: {ROLE_NOTE.viewer}.
        </Text>
      </Card>
      {canInvite ? (
        <Card testID="invite-card">
          <Heading>Invite someone</Heading>
          <Text color="inkSoft">They get an e-mail with a link that works once, for 7 days.</Text>
          <InviteForm tripId={tripId} myRole={myRole} />
        </Card>
      ) : (
        <Card testID="invite-readonly">
          <Text color="inkSoft">
            As {ROLE_LABEL[myRole]} you can see who is on the trip; the owner or a planner invites new people.
          </Text>
        </Card>
      )}
      {canInvite ? (
        <Card testID="invites-card">
          <Heading>Waiting to join</Heading>
          <PendingInvites tripId={tripId} canManage={canManage} />
        </Card>
      ) : null}
    </>
  );
  const side = (
    <>
      {canInvite ? (
        <Card testID="share-club-card">
          <Heading>Shared with clubs</Heading>
          <TripClubShares tripId={tripId} isOwner={canManage} />
        </Card>
      ) : null}
      <Card testID="activity">
        <Heading>Recent changes</Heading>
        <ActivityList tripId={tripId} />
      </Card>
    </>
  );
  return (
    <TabScroll testID="people-screen">
      <Panes main={main} side={side} />
    </TabScroll>
  );
}
