import { useLocalSearchParams } from 'expo-router';
import { InviteAcceptScreen } from '@/components/invites/invite-accept-screen';

// Outside the signed-in and signed-out groups: the link must open either way.
export default function ClubInviteRoute() {
  const { token } = useLocalSearchParams<{ token: string }>();
  return <InviteAcceptScreen kind="club" token={token} />;
}
