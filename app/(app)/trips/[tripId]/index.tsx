import { useLocalSearchParams } from 'expo-router';
import { Card } from '@/components/ui/card';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { countNights, formatTripDates } from '@/components/trips/format-trip-dates';
import { useTripQuery } from '@/stores/queries/trips';

export default function TripScreen() {
  const { tripId } = useLocalSearchParams<{ tripId: string }>();
  const trip = useTripQuery(tripId);
  if (trip.isPending) {
    return (
      <Screen testID="trip-screen-loading">
        <Skeleton testID="trip-loading" height={160} />
      </Screen>
    );
  }
  if (trip.isError) {
    return (
      <Screen testID="trip-screen-error" title="Trip">
        <QueryError testID="trip-error" error={trip.error} onRetry={() => void trip.refetch()} />
      </Screen>
    );
  }
  const { name, startDate, endDate, timeZone } = trip.data.trip;
  return (
    <Screen testID="trip-screen" title={name} subtitle={formatTripDates(startDate, endDate)}>
      <Card>
        <Text variant="label">{countNights(startDate, endDate)} nights</Text>
        <Text color="inkSoft">Times are shown in {timeZone.replace(/_/g, ' ')}.</Text>
      </Card>
    </Screen>
  );
}
