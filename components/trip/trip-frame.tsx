import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, ScrollView, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { formatTripDates } from '@/components/trips/format-trip-dates';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { useTripQuery } from '@/stores/queries/trips';
import { activeTab, tabHref, TRIP_TABS } from './trip-tabs';

/** The trip's header and its tab strip; the selected tab's screen fills the rest. */
export function TripFrame({ tripId, children }: { tripId: string; children: ReactNode }) {
  const wide = useIsWide();
  const pathname = usePathname();
  const trip = useTripQuery(tripId);
  const current = activeTab(pathname, tripId);

  const tabs = TRIP_TABS.map((tab) => {
    const active = tab.segment === current.segment;
    return (
      <Link key={tab.testID} href={tabHref(tripId, tab)} asChild>
        <Pressable
          testID={tab.testID}
          accessibilityRole="link"
          accessibilityLabel={`${tab.label} tab`}
          aria-current={active ? 'page' : undefined}
          style={StyleSheet.flatten([styles.tab, active ? styles.tabActive : null])}
        >
          <Text variant="label" color={active ? 'white' : 'ink'}>
            {tab.label}
          </Text>
        </Pressable>
      </Link>
    );
  });

  return (
    <View style={styles.root} testID="trip-frame">
      <View style={[styles.header, wide ? styles.headerWide : null]}>
        {!wide ? (
          <Link href="/" asChild>
            <Pressable
              testID="back-to-trips"
              accessibilityRole="link"
              accessibilityLabel="Back to trips"
              style={styles.back}
            >
              <Text variant="label" color="pine">
                ‹ Trips
              </Text>
            </Pressable>
          </Link>
        ) : null}
        {trip.isPending ? (
          <Skeleton height={40} testID="trip-header-loading" />
        ) : trip.isError ? (
          <QueryError testID="trip-error" error={trip.error} onRetry={() => void trip.refetch()} />
        ) : (
          <View style={styles.titleRow}>
            <Text
              variant={wide ? 'display' : 'title'}
              role="heading"
              aria-level={1}
              numberOfLines={2}
              style={styles.title}
            >
              {trip.data.trip.name}
            </Text>
            <Text color="inkSoft" variant="caption">
              {formatTripDates(trip.data.trip.startDate, trip.data.trip.endDate)} · {ROLE_LABEL[trip.data.trip.role]}
            </Text>
          </View>
        )}
        <ScrollView
          horizontal
          showsHorizontalScrollIndicator={false}
          contentContainerStyle={styles.tabs}
          role="navigation"
          aria-label="Trip sections"
        >
          {tabs}
        </ScrollView>
      </View>
      <View style={styles.body}>{trip.isSuccess ? children : null}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.dune },
  header: {
    paddingHorizontal: space.lg,
    paddingTop: space.md,
    gap: space.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    backgroundColor: colors.dune,
  },
  headerWide: { paddingHorizontal: space.xxl, paddingTop: space.xl },
  back: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
  titleRow: { gap: space.xs },
  title: { flexShrink: 1 },
  tabs: { gap: space.xs, paddingBottom: space.md },
  tab: {
    minHeight: 44,
    paddingHorizontal: space.lg,
    justifyContent: 'center',
    borderRadius: radii.pill,
    backgroundColor: colors.card,
    borderWidth: 1,
    borderColor: colors.line,
  },
  tabActive: { backgroundColor: colors.pine, borderColor: colors.pine },
  body: { flex: 1 },
});
