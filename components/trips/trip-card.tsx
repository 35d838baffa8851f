import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { countNights, formatTripDates } from './format-trip-dates';

export function TripCard({ trip }: { trip: TripSummary }) {
  const nights = countNights(trip.startDate, trip.endDate);
  const dates = formatTripDates(trip.startDate, trip.endDate);
  return (
    <Link href={{ pathname: '/trips/[tripId]', params: { tripId: trip.id } }} asChild>
      <Pressable
        testID={`trip-card-${trip.id}`}
        accessibilityRole="link"
        accessibilityLabel={`${trip.name}, ${dates}, ${nights} nights`}
        style={styles.press}
      >
        <Card>
          <Text variant="title">{trip.name}</Text>
          <Text color="inkSoft">{dates}</Text>
          <View style={styles.meta}>
            <View style={styles.chip}>
              <Text variant="figure" color="pine">
                {nights}
              </Text>
              <Text variant="unit" color="pine">
                {nights === 1 ? 'night' : 'nights'}
              </Text>
            </View>
            <Text variant="caption" color="inkSoft">
              {trip.timeZone.replace(/_/g, ' ')}
            </Text>
          </View>
        </Card>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  press: { borderRadius: radii.lg },
  meta: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', marginTop: space.sm, gap: space.md },
  chip: {
    flexDirection: 'row',
    alignItems: 'baseline',
    gap: space.xs,
    backgroundColor: colors.pineSoft,
    borderRadius: radii.pill,
    paddingHorizontal: space.lg,
    paddingVertical: space.xs,
  },
});
