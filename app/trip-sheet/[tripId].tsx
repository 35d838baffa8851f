import { useLocalSearchParams } from 'expo-router';
import { TripSheetScreen } from '@/components/trip-sheet/trip-sheet-screen';

// Outside the signed-in group, so the printed page carries no navigation; signed out, it says to sign in.
export default function TripSheetRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  return <TripSheetScreen tripId={tripId} />;
}
