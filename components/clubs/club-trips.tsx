import { Link } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatTripDates } from '@/components/trips/format-trip-dates';
import { colors, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { ConfirmAction } from '@/components/people/confirm-action';
import type { ClubDetail } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useUnshareTripMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';
import { CopyOntoRig } from './copy-onto-rig';

type SharedTrip = ClubDetail['trips'][number];

function TripRow({ clubId, trip, organiser }: { clubId: string; trip: SharedTrip; organiser: boolean }) {
  const [copying, setCopying] = useState(false);
  const unshare = useUnshareTripMutation(clubId);
  const id = trip.tripId;
  return (
    <View style={styles.row} testID={`club-trip-${id}`}>
      <Link
        href={{ pathname: '/trips/[tripId]', params: { tripId: id } }}
        testID={`club-trip-${id}-open`}
        accessibilityLabel={`Open the club's plan ${trip.name}`}
      >
        <Text variant="title" color="ink">
          {trip.name}
        </Text>
      </Link>
      <Text color="inkSoft">
        {formatTripDates(trip.startDate, trip.endDate)}
        {trip.sharedByName ? ` · shared by ${trip.sharedByName}` : ''}
      </Text>
      <Text variant="caption" color="pine" testID={`club-trip-${id}-copies`}>
        {trip.copies === 0
          ? 'No household has copied it yet'
          : `${trip.copies} ${trip.copies === 1 ? 'household has' : 'households have'} copied it`}
      </Text>
      {copying ? (
        <CopyOntoRig tripId={id} tripName={trip.name} onCancel={() => setCopying(false)} />
      ) : (
        <View style={styles.actions}>
          {trip.myCopyTripId ? (
            <Link
              href={{ pathname: '/trips/[tripId]', params: { tripId: trip.myCopyTripId } }}
              testID={`club-trip-${id}-my-copy`}
              accessibilityLabel={`Open my copy of ${trip.name}`}
            >
              <Text variant="label" color="pine">
                Open my copy ›
              </Text>
            </Link>
          ) : null}
          <Button
            testID={`club-trip-${id}-copy`}
            label={trip.myCopyTripId ? 'Copy again' : 'Copy onto my rig'}
            accessibilityLabel={`Copy ${trip.name} onto my rig`}
            tone={trip.myCopyTripId ? 'quiet' : 'primary'}
            onPress={() => setCopying(true)}
          />
          {organiser ? (
            <ConfirmAction
              testID={`club-trip-${id}-unshare`}
              label="Stop sharing"
              question={`Stop sharing ${trip.name}? Members' copies stay theirs.`}
              confirmLabel="Yes, stop sharing"
              busy={unshare.isPending}
              onConfirm={() =>
                unshare.mutate(id, {
                  onSuccess: () => showToast(`${trip.name} is no longer shared.`),
                  onError: (e) =>
                    showToast(e instanceof ApiError ? e.message : 'That did not work.', { tone: 'danger' }),
                })
              }
            />
          ) : null}
        </View>
      )}
    </View>
  );
}

export function ClubTrips({ detail }: { detail: ClubDetail }) {
  const organiser = detail.club.role === 'organiser';
  if (detail.trips.length === 0)
    return (
      <Text color="inkSoft" testID="club-trips-empty">
        {organiser
          ? 'No trip shared yet. Open one of your trips, go to its People tab and choose “Share to a club”.'
          : 'The organiser has not shared a trip yet. When they do, you can copy it onto your own rig here.'}
      </Text>
    );
  return (
    <View testID="club-trips">
      {detail.trips.map((trip) => (
        <TripRow key={trip.tripId} clubId={detail.club.id} trip={trip} organiser={organiser} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.xs, paddingVertical: space.md, borderBottomWidth: 1, borderBottomColor: colors.line },
  actions: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md, paddingTop: space.xs },
});
