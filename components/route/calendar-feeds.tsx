import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { localMoment } from '@/components/format/time';
import { colors, radii, space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import type { CalendarFeed } from '@/shared/schemas/calendar';
import { ApiError } from '@/stores/queries/api-client';
import {
  useCalendarFeedCreateMutation,
  useCalendarFeedRevokeMutation,
  useCalendarFeedsQuery,
} from '@/stores/queries/trip-exports';
import { showToast } from '@/stores/toast-store';

/**
 * A private address a phone or desktop calendar can subscribe to, so it follows the plan as it changes. Shown in
 * full once, when made (the server keeps only a hash); each can be stopped at any time.
 */
export function CalendarFeeds({ tripId }: { tripId: string }) {
  const [open, setOpen] = useState(false);
  const feeds = useCalendarFeedsQuery(tripId, open);
  const create = useCalendarFeedCreateMutation(tripId);
  const revoke = useCalendarFeedRevokeMutation(tripId);
  const [made, setMade] = useState<CalendarFeed | null>(null);
  const [error, setError] = useState<string>();

  if (!open)
    return (
      <Button
        testID="calendar-subscribe-open"
        tone="secondary"
        label="Subscribe in a calendar app"
        onPress={() => setOpen(true)}
      />
    );

  return (
    <View style={styles.box} testID="calendar-feeds">
      <Text variant="label">Calendar subscription</Text>
      <Text variant="caption" color="inkSoft">
        A private address your calendar checks every hour or so. Anyone with it can read the plan: share it only with
        your own devices, and stop it if it leaks.
      </Text>
      {error || feeds.error ? (
        <Banner
          testID="calendar-feeds-error"
          message={
            error ?? (feeds.error instanceof ApiError ? feeds.error.message : 'The addresses could not be loaded.')
          }
        />
      ) : null}
      {made?.url ? (
        <View style={styles.made} testID="calendar-feed-made">
          <Text variant="caption">Your new address (shown only now):</Text>
          <Text selectable testID="calendar-feed-url" style={styles.url}>
            {made.url}
          </Text>
          <View style={styles.actions}>
            <Button
              testID="calendar-feed-copy"
              tone="secondary"
              label="Copy the address"
              onPress={() =>
                void navigator.clipboard
                  ?.writeText(made.url ?? '')
                  .then(() => showToast('Address copied'))
                  .catch(() => showToast('Select the address and copy it by hand.', { tone: 'danger' }))
              }
            />
            {made.webcalUrl ? (
              <Button
                testID="calendar-feed-webcal"
                tone="quiet"
                label="Open in the calendar app"
                onPress={() => {
                  if (made.webcalUrl) window.location.href = made.webcalUrl;
                }}
              />
            ) : null}
          </View>
        </View>
      ) : null}
      {(feeds.data?.feeds ?? []).map((feed, i) => (
        <View key={feed.id} style={styles.feed} testID={`calendar-feed-${i}`}>
          <Text variant="caption" style={styles.feedText}>
            Made {localMoment(feed.createdAt)}
            {feed.lastFetchedAt ? `, last read ${localMoment(feed.lastFetchedAt)}` : ', not read yet'}
          </Text>
          <Button
            testID={`calendar-feed-${i}-stop`}
            tone="quiet"
            label="Stop this address"
            busy={revoke.isPending}
            onPress={() =>
              revoke.mutate(feed.id, {
                onSuccess: () => {
                  if (made?.id === feed.id) setMade(null);
                  showToast('That address no longer works');
                },
              })
            }
          />
        </View>
      ))}
      <View style={styles.actions}>
        <Button
          testID="calendar-feed-create"
          label="Make a subscription address"
          busy={create.isPending}
          onPress={() => {
            setError(undefined);
            create.mutate(undefined, {
              onSuccess: setMade,
              onError: (e) => setError(e instanceof ApiError ? e.message : 'The address could not be made.'),
            });
          }}
        />
        <Button testID="calendar-feeds-close" tone="quiet" label="Close" onPress={() => setOpen(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.line },
  made: { gap: space.xs, padding: space.md, borderRadius: radii.sm, backgroundColor: colors.pineSoft },
  url: { fontFamily: 'monospace', fontSize: 13, color: colors.ink },
  feed: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  feedText: { flex: 1, minWidth: 180 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
