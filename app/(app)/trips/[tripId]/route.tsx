import { useLocalSearchParams } from 'expo-router';
import { RouteScreen } from '@/components/trip/lazy-trip-screens';
import { BasedOnBanner } from '@/components/trip/based-on-banner';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripRouteRoute() {
  const { tripId, stop } = useLocalSearchParams<{ tripId: string; stop?: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? (
    <>
      <BasedOnBanner detail={trip.data} />
      <RouteScreen detail={trip.data} initialStopId={stop} />
    </>
  ) : null;
}
