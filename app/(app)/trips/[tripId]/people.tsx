import { useLocalSearchParams } from 'expo-router';
import { PeopleScreen } from '@/components/trip/lazy-trip-screens';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripPeopleRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? <PeopleScreen detail={trip.data} /> : null;
}
