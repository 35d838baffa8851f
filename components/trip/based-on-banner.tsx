import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import { ApiError } from '@/stores/queries/api-client';
import { useBasedOnSeenMutation } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';

/** On a member's copy of a club's trip: where it came from, and whether the club's stops have moved since. */
export function BasedOnBanner({ detail }: { detail: TripDetail }) {
  const wide = useIsWide();
  const seen = useBasedOnSeenMutation(detail.trip.id);
  const basedOn = detail.basedOn;
  if (!basedOn) return null;
  return (
    <View style={[styles.wrap, wide ? styles.wrapWide : null]}>
      <View
        style={[styles.banner, basedOn.routeChanged ? styles.changed : null]}
        testID="based-on-banner"
        role="status"
      >
        <Text variant="label">
          Based on the club's plan{' '}
          <Link
            href={{ pathname: '/trips/[tripId]', params: { tripId: basedOn.tripId } }}
            testID="based-on-open"
            accessibilityLabel={`Open the club's plan ${basedOn.name}`}
          >
            <Text variant="label" color="pine" style={styles.link}>
              {basedOn.name}
            </Text>
          </Link>
        </Text>
        {basedOn.routeChanged ? (
          <View style={styles.row} testID="based-on-changed">
            <Text style={styles.grow}>
              The club's plan changed its stops since you copied it. Compare the Route tabs and adjust yours if needed.
            </Text>
            <Button
              testID="based-on-seen"
              label="Got it"
              accessibilityLabel="Got it: stop telling me the club's plan changed"
              tone="secondary"
              busy={seen.isPending}
              onPress={() =>
                seen.mutate(undefined, {
                  onError: (e) =>
                    showToast(e instanceof ApiError ? e.message : 'That did not work. Please try again.', {
                      tone: 'danger',
                    }),
                })
              }
            />
          </View>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { paddingHorizontal: space.lg, paddingTop: space.md },
  wrapWide: { paddingHorizontal: space.xxl },
  banner: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.pineSoft,
  },
  changed: { borderColor: colors.sunlit, backgroundColor: colors.card },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  grow: { flex: 1, minWidth: 200 },
  link: { textDecorationLine: 'underline' },
});
