import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { space } from '@/components/theme/tokens';
import type { TripSummary } from '@/shared/schemas/trip-summary';
import { ApiError } from '@/stores/queries/api-client';
import { useTripDeleteMutation, useTripDuplicateMutation } from '@/stores/queries/trips';
import { scheduleDelete, undoDelete, usePendingDeleteStore } from '@/stores/pending-delete-store';
import { showToast } from '@/stores/toast-store';
import { TripCard } from './trip-card';

export function TripList({ trips }: { trips: TripSummary[] }) {
  const wide = useIsWide();
  const router = useRouter();
  const pending = usePendingDeleteStore((s) => s.ids);
  const duplicate = useTripDuplicateMutation();
  const remove = useTripDeleteMutation();
  const shown = trips.filter((t) => !pending.includes(t.id));
  return (
    <View style={[styles.grid, wide ? styles.wide : null]} testID="trip-list" role="list">
      {shown.map((trip) => (
        <View key={trip.id} role="listitem" style={wide ? styles.wideItem : null}>
          <TripCard
            trip={trip}
            canDelete={trip.role === undefined || trip.role === 'owner'}
            busy={duplicate.isPending && duplicate.variables === trip.id}
            onDuplicate={async () => {
              try {
                const copy = await duplicate.mutateAsync(trip.id);
                showToast(`Copied to “${copy.trip.name}”`, {
                  action: { label: 'Open', run: () => router.push(`/trips/${copy.trip.id}`) },
                });
              } catch (error) {
                showToast(error instanceof ApiError ? error.message : 'The trip could not be copied.', {
                  tone: 'danger',
                });
              }
            }}
            onDelete={() => {
              scheduleDelete(
                trip.id,
                () => remove.mutateAsync(trip.id),
                () => showToast(`“${trip.name}” could not be deleted.`, { tone: 'danger' }),
              );
              showToast(`“${trip.name}” deleted`, {
                tone: 'info',
                action: { label: 'Undo', run: () => undoDelete(trip.id) },
              });
            }}
          />
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
