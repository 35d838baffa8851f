import { useLocalSearchParams } from 'expo-router';
import { LedgerScreen } from '@/components/ledger/ledger-screen';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripLedgerRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  return trip.data ? <LedgerScreen detail={trip.data} /> : null;
}
