import { useLocalSearchParams } from 'expo-router';
import { ClubScreen } from '@/components/clubs/club-screen';

export default function ClubRoute() {
  const { clubId } = useLocalSearchParams<{ clubId: string }>();
  return <ClubScreen clubId={clubId} />;
}
