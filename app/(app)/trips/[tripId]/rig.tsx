import { useLocalSearchParams } from 'expo-router';
import { RigScreen } from '@/components/trip/lazy-trip-screens';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripRigRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? <RigScreen detail={trip.data} /> : null;
}
