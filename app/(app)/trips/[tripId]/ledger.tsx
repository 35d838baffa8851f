import { useLocalSearchParams } from 'expo-router';
import { LedgerScreen } from '@/components/trip/lazy-trip-screens';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripLedgerRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? <LedgerScreen detail={trip.data} /> : null;
}
