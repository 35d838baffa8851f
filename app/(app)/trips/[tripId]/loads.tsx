import { useLocalSearchParams } from 'expo-router';
import { LoadsScreen } from '@/components/trip/lazy-trip-screens';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripLoadsRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? <LoadsScreen detail={trip.data} /> : null;
}
