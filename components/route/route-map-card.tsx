import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { LatLon } from '@/shared/geo/great-circle';
import { formatDecimal } from '@/shared/geo/parse-coordinates';
import type { TripDetail } from '@/shared/schemas/api';
import { PLACE_DATA_CREDIT } from '@/shared/schemas/places';
import { ApiError } from '@/stores/queries/api-client';
import { useBudgetQuery } from '@/stores/queries/budget';
import { useStopSaveMutation } from '@/stores/queries/route';
import { showToast } from '@/stores/toast-store';
import { NearestTowns } from './nearest-towns';
import { mapStops, RouteMap } from './route-map';

type Props = { detail: TripDetail; canEdit: boolean; selectedStopId: string | null; onOpenStop: (id: string) => void };

function Legend() {
  const item = (shape: object, label: string) => (
    <View style={styles.legendItem}>
      <View style={[styles.legendMark, shape]} />
      <Text variant="caption">{label}</Text>
    </View>
  );
  return (
    <View style={styles.legend} accessibilityLabel="Marker key" testID="route-map-legend">
      {item(styles.pine, 'comfortable')}
      {item(styles.sunlit, 'close to the reserve')}
      {item(styles.ember, 'below the reserve')}
    </View>
  );
}

/**
 * The Route tab's map. Markers open their stop; a planner can drag one, nudge it with the arrow keys, or choose
 * "Place pin" and tap the map. A move is only proposed until it is saved, with the nearest towns to check it by.
 */
export function RouteMapCard({ detail, canEdit, selectedStopId, onOpenStop }: Props) {
  const wide = useIsWide();
  const budget = useBudgetQuery(detail.trip.id);
  const save = useStopSaveMutation(detail.trip.id);
  const [placing, setPlacing] = useState(false);
  const [pending, setPending] = useState<{ stopId: string; to: LatLon } | null>(null);
  const stops = mapStops(detail.stops, budget.data?.result ?? null).map((s) =>
    pending && s.id === pending.stopId ? { ...s, ...pending.to } : s,
  );
  const moving = pending ? detail.stops.find((s) => s.id === pending.stopId) : undefined;
  const selected = detail.stops.find((s) => s.id === selectedStopId);
  if (detail.stops.length === 0) return null;

  const savePosition = async () => {
    if (!pending || !moving) return;
    const { default: tzlookup } = await import('tz-lookup');
    let timeZone = moving.stop.timeZone;
    try {
      timeZone = tzlookup(pending.to.lat, pending.to.lon);
    } catch {
      // Out at sea or off the map: keep the zone the stop had.
    }
    try {
      await save.mutateAsync({
        stopId: moving.id,
        version: moving.version,
        stop: { ...moving.stop, ...pending.to, timeZone },
        notes: moving.notes,
      });
      showToast(`${moving.stop.name} moved`);
      setPending(null);
      setPlacing(false);
    } catch (error) {
      showToast(error instanceof ApiError ? error.message : 'The new position could not be saved.', { tone: 'danger' });
    }
  };

  return (
    <Card testID="route-map-card">
      <View style={styles.head}>
        <Text variant="title" role="heading" aria-level={2} style={styles.title}>
          Map
        </Text>
        {canEdit ? (
          <Button
            testID="route-map-place-pin"
            tone={placing ? 'primary' : 'secondary'}
            label={placing ? 'Placing the pin: tap the map' : 'Place pin'}
            accessibilityLabel={
              selected
                ? `Place the pin for ${selected.stop.name} by tapping the map`
                : 'Place a pin: choose a stop first'
            }
            aria-pressed={placing}
            disabled={!selected}
            onPress={() => setPlacing(!placing)}
          />
        ) : null}
      </View>
      {canEdit && !selected ? (
        <Text variant="caption" color="inkSoft">
          Choose a stop (press its marker or Edit) to move its pin; you can also drag a marker.
        </Text>
      ) : null}
      <RouteMap
        testID="route-map"
        label={`Map of ${detail.trip.name}: ${detail.stops.length} stops in order`}
        stops={stops}
        height={wide ? 420 : 300}
        onOpenStop={onOpenStop}
        onMoveStop={
          canEdit
            ? (stopId, to) => {
                setPending({ stopId, to });
                setPlacing(false);
              }
            : undefined
        }
        placingStopId={placing && selected ? selected.id : null}
      />
      {pending && moving ? (
        <View style={styles.pending} testID="route-map-pending">
          <Text variant="label">
            Move {moving.stop.name} to {formatDecimal(pending.to)}?
          </Text>
          <NearestTowns lat={pending.to.lat} lon={pending.to.lon} testID="route-map-pending-towns" />
          <View style={styles.actions}>
            <Button
              testID="route-map-pending-save"
              label="Save the position"
              busy={save.isPending}
              onPress={() => void savePosition()}
            />
            <Button
              testID="route-map-pending-cancel"
              tone="quiet"
              label="Put it back"
              onPress={() => setPending(null)}
            />
          </View>
        </View>
      ) : null}
      <Legend />
      <Text variant="caption" color="inkSoft">
        {PLACE_DATA_CREDIT}
      </Text>
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  title: { flex: 1 },
  pending: { gap: space.sm, padding: space.md, borderRadius: 12, backgroundColor: colors.infoSoft },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  legendMark: { width: 14, height: 14, borderWidth: 2, borderColor: colors.white },
  pine: { backgroundColor: colors.pine, borderRadius: 7 },
  sunlit: { backgroundColor: colors.sunlit, borderRadius: 7, borderColor: colors.ink, borderStyle: 'dashed' },
  ember: { backgroundColor: colors.emberInk, borderRadius: 2 },
});
