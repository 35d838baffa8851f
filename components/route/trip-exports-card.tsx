import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import { tripFileUrl } from '@/stores/queries/trip-exports';
import { CalendarFeeds } from './calendar-feeds';
import { startDownload } from './file-transfer';
import { GpxImport } from './gpx-import';

/** The route in and out: GPX import and export, the calendar, and the printable trip sheet. */
export function TripExportsCard({ detail }: { detail: TripDetail }) {
  const router = useRouter();
  const tripId = detail.trip.id;
  const hasStops = detail.stops.length > 0;
  return (
    <Card testID="trip-exports">
      <Text variant="title" role="heading" aria-level={2}>
        Take the plan along
      </Text>
      {can(detail.trip.role, 'editTrip') ? <GpxImport detail={detail} /> : null}
      <View style={styles.actions}>
        <Button
          testID="gpx-export"
          tone="secondary"
          label="Export GPX"
          accessibilityLabel="Download the stops and drives as a GPX file for a navigation app"
          disabled={!hasStops}
          onPress={() => startDownload(tripFileUrl(tripId, 'export.gpx'))}
        />
        <Button
          testID="calendar-download"
          tone="secondary"
          label="Add to calendar"
          accessibilityLabel="Download the trip as a calendar file (.ics)"
          disabled={!hasStops}
          onPress={() => startDownload(tripFileUrl(tripId, 'calendar.ics'))}
        />
        <Button
          testID="trip-sheet-open"
          tone="secondary"
          label="Print trip sheet"
          accessibilityLabel="Open the trip sheet to print it"
          disabled={!hasStops}
          onPress={() => router.push({ pathname: '/trip-sheet/[tripId]', params: { tripId } })}
        />
      </View>
      {hasStops ? <CalendarFeeds tripId={tripId} /> : null}
    </Card>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
