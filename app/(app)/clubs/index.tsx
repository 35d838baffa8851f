import { ClubListScreen } from '@/components/clubs/club-list-screen';

export default function ClubsRoute() {
  return <ClubListScreen />;
}
