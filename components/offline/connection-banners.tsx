import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { useWaitingSaveCount } from '@/stores/queries/offline-queue';
import { useAppUpdate } from './use-app-update';
import { useOnline } from './use-online';
import { dataAge } from './data-age';

/**
 * "You're offline" with the age of what is shown, how many changes are waiting to sync, and "updated — reload" after
 * a new release took over.
 */
export function ConnectionBanners() {
  const online = useOnline();
  const updated = useAppUpdate();
  const queryClient = useQueryClient();
  const waiting = useWaitingSaveCount();
  // The age is read once a minute: precise enough for "saved 3 h ago".
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const timer = setInterval(() => setNow(Date.now()), 60_000);
    return () => clearInterval(timer);
  }, []);
  if (online && !updated && waiting === 0) return null;
  const newest = Math.max(
    0,
    ...queryClient
      .getQueryCache()
      .getAll()
      .map((q) => q.state.dataUpdatedAt),
  );
  return (
    <View style={styles.wrap}>
      {!online ? (
        <View style={[styles.banner, styles.offline]} testID="offline-banner" role="status">
          <Text variant="label">You're offline.</Text>
          <Text variant="caption">
            {newest > 0
              ? `Showing what this device saved ${dataAge(newest, now)}. `
              : 'Nothing saved on this device yet. '}
            Check-ins, appliances and routines you change are kept here and sent when you are back online.
          </Text>
        </View>
      ) : null}
      {waiting > 0 ? (
        <View style={[styles.banner, styles.waiting]} testID="sync-waiting" role="status">
          <Text variant="label">
            {waiting === 1 ? '1 change waiting to sync' : `${waiting} changes waiting to sync`}
          </Text>
          <Text variant="caption">
            {online ? 'Sending now, in the order they were made.' : 'They go out in order once there is a signal.'}
          </Text>
        </View>
      ) : null}
      {updated ? (
        <View style={[styles.banner, styles.updated]} testID="update-banner" role="status">
          <Text variant="label">Trailtally was updated — reload to use the new version.</Text>
          <Button
            testID="update-reload"
            label="Reload"
            onPress={() => {
              if (typeof window !== 'undefined') window.location.reload();
            }}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { padding: space.lg, paddingBottom: 0, gap: space.sm },
  banner: { padding: space.md, borderRadius: radii.md, gap: space.xs, borderWidth: 1 },
  offline: { backgroundColor: colors.infoSoft, borderColor: colors.lake },
  waiting: { backgroundColor: colors.sunlitSoft, borderColor: colors.sunlit },
  updated: { backgroundColor: colors.pineSoft, borderColor: colors.pine },
});
