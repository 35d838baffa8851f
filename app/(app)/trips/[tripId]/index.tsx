import { useLocalSearchParams } from 'expo-router';
import { BudgetScreen } from '@/components/trip/lazy-trip-screens';
import { BasedOnBanner } from '@/components/trip/based-on-banner';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripBudgetRoute() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  // The trip frame shows loading and errors; a tab renders once the trip is here.
  return trip.data ? (
    <>
      <BasedOnBanner detail={trip.data} />
      <BudgetScreen detail={trip.data} />
    </>
  ) : null;
}
