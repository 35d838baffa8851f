import { Link } from 'expo-router';
import { useEffect } from 'react';
import { Pressable, StyleSheet } from 'react-native';
import { preloadChart } from '@/components/budget/chart-loader';
import { whenIdle } from '@/components/layout/when-idle';
import { preloadTripScreens } from '@/components/trip/lazy-trip-screens';
import { TripList } from '@/components/trips/trip-list';
import { colors, radii, space } from '@/components/theme/tokens';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { useTripsQuery } from '@/stores/queries/trips';

function NewTripLink({ testID }: { testID: string }) {
  return (
    <Link href="/trips/new" asChild>
      <Pressable testID={testID} accessibilityRole="link" accessibilityLabel="Plan a new trip" style={styles.newTrip}>
        <Text variant="label" color="white">
          + New trip
        </Text>
      </Pressable>
    </Link>
  );
}

export default function TripsScreen() {
  const trips = useTripsQuery();
  // Once the list has drawn, a trip's screens and then the chart's bytes come down in the background, so a trip
  // opened later shows and draws at once. The screens (small, and what a trip's headline needs) go first: on a slow
  // link, sharing it with the chart's megabytes would hold up the headline of a trip opened at once.
  useEffect(() => whenIdle(() => void preloadTripScreens().then(preloadChart)), []);
  return (
    <Screen
      testID="trips-screen"
      title="Trips"
      subtitle="Every trip, checked hour by hour against your rig."
      actions={<NewTripLink testID="new-trip" />}
    >
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
          action={<NewTripLink testID="trips-empty-new" />}
        />
      ) : (
        <TripList trips={trips.data.trips} />
      )}
    </Screen>
  );
}

// Link asChild needs one flat style object on the web.
const styles = StyleSheet.create({
  newTrip: {
    minHeight: 48,
    paddingHorizontal: space.xl,
    borderRadius: radii.pill,
    backgroundColor: colors.pine,
    alignItems: 'center',
    justifyContent: 'center',
  },
});
