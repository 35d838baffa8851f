import { Skeleton } from '@/components/ui/skeleton';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { TripList } from '@/components/trips/trip-list';
import { useTripsQuery } from '@/stores/queries/trips';

export default function TripsScreen() {
  const trips = useTripsQuery();
  return (
    <Screen testID="trips-screen" title="Trips" subtitle="Every trip, checked hour by hour against your rig.">
      {trips.isPending ? (
        <>
          <Skeleton testID="trips-loading" height={132} />
          <Skeleton height={132} />
        </>
      ) : trips.isError ? (
        <QueryError testID="trips-error" error={trips.error} onRetry={() => void trips.refetch()} />
      ) : trips.data.trips.length === 0 ? (
        <EmptyState
          testID="trips-empty"
          title="No trips yet"
          body="A trip is your route, your rig and your daily routines. Once you plan one, Trailtally shows where the stored energy runs short and what fixes it."
        />
      ) : (
        <TripList trips={trips.data.trips} />
      )}
    </Screen>
  );
}
