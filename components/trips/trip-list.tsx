import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { space } from '@/components/theme/tokens';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { TripCard } from './trip-card';

export function TripList({ trips }: { trips: TripSummary[] }) {
  const wide = useIsWide();
  return (
    <View style={[styles.grid, wide ? styles.wide : null]} testID="trip-list" role="list">
      {trips.map((trip) => (
        <View key={trip.id} role="listitem" style={wide ? styles.wideItem : null}>
          <TripCard trip={trip} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: space.lg },
  wide: { flexDirection: 'row', flexWrap: 'wrap' },
  wideItem: { width: '48%', flexGrow: 1 },
});
