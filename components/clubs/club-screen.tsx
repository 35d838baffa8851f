import { Link } from 'expo-router';
import { StyleSheet } from 'react-native';
import { Panes } from '@/components/trip/tab-scroll';
import { space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { useClubQuery } from '@/stores/queries/clubs';
import { ClubInviteForm } from './club-invite-form';
import { ClubMembers, ClubPendingInvites } from './club-people';
import { ClubTrips } from './club-trips';

function Heading({ children }: { children: string }) {
  return (
    <Text variant="title" role="heading" aria-level={2}>
      {children}
    </Text>
  );
}

const BackLink = () => (
  <Link href="/clubs" testID="back-to-clubs" accessibilityLabel="Back to Clubs" style={styles.back}>
    <Text variant="label" color="pine">
      ‹ Clubs
    </Text>
  </Link>
);

/** One club: its shared trips (copy onto my rig), its households, and for the organiser, invites. */
export function ClubScreen({ clubId }: { clubId: string }) {
  const club = useClubQuery(clubId);
  if (club.isPending)
    return (
      <Screen testID="club-screen" title="Club">
        <Skeleton testID="club-loading" height={200} />
      </Screen>
    );
  if (club.isError)
    return (
      <Screen testID="club-screen" title="Club">
        <BackLink />
        <QueryError testID="club-error" error={club.error} onRetry={() => void club.refetch()} />
      </Screen>
    );
  const detail = club.data;
  const organiser = detail.club.role === 'organiser';
  const main = (
    <>
      <Card testID="club-trips-card">
        <Heading>Shared trips</Heading>
        <ClubTrips detail={detail} />
      </Card>
      <Card testID="club-members-card">
        <Heading>{`Households (${detail.members.length})`}</Heading>
        <ClubMembers detail={detail} />
      </Card>
    </>
  );
  const side = organiser ? (
    <>
      <Card testID="club-invite-card">
        <Heading>Invite households</Heading>
        <ClubInviteForm clubId={clubId} />
      </Card>
      <Card testID="club-invites-card">
        <Heading>Waiting to join</Heading>
        <ClubPendingInvites detail={detail} />
      </Card>
    </>
  ) : null;
  return (
    <Screen
      testID="club-screen"
      title={detail.club.name}
      subtitle={
        organiser
          ? 'You organise this club.'
          : 'You are a member. Copy a shared trip onto your rig to check it against your own batteries.'
      }
      actions={<BackLink />}
    >
      {side ? <Panes main={main} side={side} sideWidth={440} /> : main}
    </Screen>
  );
}

const styles = StyleSheet.create({ back: { minHeight: 44, paddingVertical: space.sm } });
