import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { countNights, formatTripDates } from './format-trip-dates';
import { SocGauge } from './soc-gauge';
import { TripCardMap } from '@/components/route/route-mini-map';

type Props = { trip: TripSummary; canDelete: boolean; onDuplicate: () => void; onDelete: () => void; busy: boolean };

export function TripCard({ trip, canDelete, onDuplicate, onDelete, busy }: Props) {
  const [confirming, setConfirming] = useState(false);
  const nights = countNights(trip.startDate, trip.endDate);
  const dates = formatTripDates(trip.startDate, trip.endDate);
  const flags = trip.flagCount ?? null;
  const computing = trip.budgetStatus === 'computing';
  return (
    <Card testID={`trip-card-${trip.id}`}>
      <Link href={{ pathname: '/trips/[tripId]', params: { tripId: trip.id } }} asChild>
        <Pressable
          testID={`trip-open-${trip.id}`}
          accessibilityRole="link"
          accessibilityLabel={`${trip.name}, ${dates}, ${nights} nights`}
          style={styles.press}
        >
          <Text variant="title">{trip.name}</Text>
          <Text color="inkSoft">
            {dates} · {nights} {nights === 1 ? 'night' : 'nights'}
          </Text>
          <Text variant="caption" color="inkSoft">
            {trip.rigName ? `Rig: ${trip.rigName}` : 'No rig yet'}
          </Text>
          {trip.sharedWith && trip.sharedWith.length > 0 ? (
            <View style={styles.shared} testID={`trip-shared-${trip.id}`}>
              <Text variant="caption" color="lakeInk">
                Shared with {trip.sharedWith.join(', ')}
              </Text>
            </View>
          ) : null}
        </Pressable>
      </Link>
      <TripCardMap trip={trip} />
      <View style={styles.meta}>
        {trip.lowestSocPct !== null && trip.lowestSocPct !== undefined ? (
          <SocGauge
            testID={`trip-gauge-${trip.id}`}
            lowestPct={trip.lowestSocPct}
            reservePct={trip.reservePct ?? null}
          />
        ) : (
          <Text variant="caption" color="inkSoft" style={styles.noBudget} testID={`trip-no-budget-${trip.id}`}>
            {computing ? 'Working out the budget…' : 'No budget yet'}
          </Text>
        )}
        {computing && trip.lowestSocPct != null ? (
          <Text variant="caption" color="inkSoft" testID={`trip-budget-updating-${trip.id}`}>
            Updating…
          </Text>
        ) : null}
        {flags !== null ? (
          <View style={[styles.flags, flags > 0 ? styles.flagsOn : null]} testID={`trip-flags-${trip.id}`}>
            <Text variant="label" color={flags > 0 ? 'ember' : 'pine'}>
              {flags === 0 ? 'No flags' : `${flags} ${flags === 1 ? 'flag' : 'flags'}`}
            </Text>
          </View>
        ) : null}
      </View>
      {confirming ? (
        <View style={styles.actions}>
          <Text variant="label" color="ember" style={styles.confirmText}>
            Delete “{trip.name}” for everyone on it?
          </Text>
          <Button testID={`trip-delete-confirm-${trip.id}`} tone="danger" label="Delete" onPress={onDelete} />
          <Button
            testID={`trip-delete-cancel-${trip.id}`}
            tone="quiet"
            label="Keep it"
            onPress={() => setConfirming(false)}
          />
        </View>
      ) : (
        <View style={styles.actions}>
          <Button
            testID={`trip-duplicate-${trip.id}`}
            tone="quiet"
            label="Duplicate"
            accessibilityLabel={`Duplicate ${trip.name}`}
            busy={busy}
            onPress={onDuplicate}
          />
          {canDelete ? (
            <Button
              testID={`trip-delete-${trip.id}`}
              tone="quiet"
              label="Delete…"
              accessibilityLabel={`Delete ${trip.name}`}
              onPress={() => setConfirming(true)}
            />
          ) : null}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  press: { borderRadius: radii.md, gap: space.xs },
  meta: { flexDirection: 'row', alignItems: 'center', gap: space.lg, marginTop: space.sm, flexWrap: 'wrap' },
  noBudget: { flex: 1 },
  flags: {
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    backgroundColor: colors.pineSoft,
  },
  flagsOn: { backgroundColor: colors.emberSoft },
  // A tinted tag, not a button: it says where the trip is shared and does nothing when tapped.
  shared: {
    alignSelf: 'flex-start',
    borderRadius: radii.sm,
    paddingHorizontal: space.sm,
    paddingVertical: 2,
    backgroundColor: colors.infoSoft,
  },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
  confirmText: { flexBasis: '100%' },
});
