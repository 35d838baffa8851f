import { useLocalSearchParams } from 'expo-router';
import { RoadScreen } from '@/components/trip/lazy-trip-screens';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripRoadRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  // The trip frame shows loading and errors; a tab renders once the trip is here.
  return trip.data ? <RoadScreen detail={trip.data} /> : null;
}
