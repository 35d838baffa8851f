import { Link, usePathname } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { formatTripDates } from '@/components/trips/format-trip-dates';
import { QueryError } from '@/components/ui/query-error';
import { SideScroll } from '@/components/ui/side-scroll';
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
  // Where each tab sits in the row, so the row can keep the open tab in view on a phone.
  const [spans, setSpans] = useState<Record<string, { x: number; width: number }>>({});

  const tabs = TRIP_TABS.map((tab) => {
    const active = tab.segment === current.segment;
    return (
      <Link key={tab.testID} href={tabHref(tripId, tab)} asChild>
        <Pressable
          testID={tab.testID}
          accessibilityRole="link"
          accessibilityLabel={`${tab.label} tab`}
          aria-current={active ? 'page' : undefined}
          onLayout={(e) => {
            const { x, width } = e.nativeEvent.layout;
            setSpans((s) =>
              s[tab.testID]?.x === x && s[tab.testID]?.width === width ? s : { ...s, [tab.testID]: { x, width } },
            );
          }}
          style={StyleSheet.flatten([styles.tab, wide ? styles.tabWide : null, active ? styles.tabActive : null])}
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
        <View style={styles.titleLine}>
          {!wide ? (
            <Link href="/" asChild>
              <Pressable
                testID="back-to-trips"
                accessibilityRole="link"
                accessibilityLabel="Back to trips"
                style={styles.back}
              >
                <Text variant="title" color="pine" style={styles.backMark}>
                  ‹
                </Text>
              </Pressable>
            </Link>
          ) : null}
          {trip.isPending ? (
            <View style={styles.titleRow}>
              <Skeleton height={wide ? 40 : 36} testID="trip-header-loading" />
            </View>
          ) : trip.isError ? (
            <View style={styles.titleRow}>
              <QueryError testID="trip-error" error={trip.error} onRetry={() => void trip.refetch()} />
            </View>
          ) : (
            <View style={styles.titleRow}>
              <Text
                variant={wide ? 'display' : 'label'}
                role="heading"
                aria-level={1}
                // One line on a phone: the header must leave the screen to the tab's content.
                numberOfLines={wide ? 2 : 1}
                style={wide ? styles.title : [styles.title, styles.titlePhone]}
              >
                {trip.data.trip.name}
              </Text>
              <Text color="inkSoft" variant="caption" numberOfLines={1}>
                {formatTripDates(trip.data.trip.startDate, trip.data.trip.endDate)} · {ROLE_LABEL[trip.data.trip.role]}
              </Text>
            </View>
          )}
        </View>
        <SideScroll
          testID="trip-tabs"
          what="More trip sections"
          contentContainerStyle={[styles.tabs, wide ? styles.tabsWide : null]}
          reveal={spans[current.testID]}
          role="navigation"
          accessibilityLabel="Trip sections"
        >
          {tabs}
        </SideScroll>
      </View>
      <View style={styles.body} testID="trip-body">
        {trip.isSuccess ? children : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.dune },
  // Compact on a phone: with the bottom bar, the chrome stays within a fifth of an 800 px screen.
  header: {
    paddingHorizontal: space.md,
    paddingTop: space.xs,
    gap: space.xs,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    backgroundColor: colors.dune,
  },
  headerWide: { paddingHorizontal: space.xxl, paddingTop: space.xl, gap: space.sm },
  titleLine: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  back: { minHeight: 44, minWidth: 40, alignItems: 'center', justifyContent: 'center' },
  backMark: { fontSize: 34, lineHeight: 38 },
  titleRow: { flex: 1, minWidth: 0 },
  title: { flexShrink: 1 },
  titlePhone: { fontSize: 17, lineHeight: 22 },
  tabs: { gap: space.xs, paddingBottom: space.xs + 2 },
  tabsWide: { paddingBottom: space.md },
  tab: {
    minHeight: 44,
    paddingHorizontal: space.md,
    justifyContent: 'center',
    borderRadius: radii.pill,
    backgroundColor: colors.card,
    borderWidth: 1,
    borderColor: colors.line,
  },
  tabWide: { paddingHorizontal: space.lg },
  tabActive: { backgroundColor: colors.pine, borderColor: colors.pine },
  body: { flex: 1 },
});
