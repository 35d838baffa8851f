import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { space } from '@/components/theme/tokens';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { dcLoadsFromAppliances } from '@/shared/engine/dc-run-defaults';
import { useMyRigsQuery, useSavedRigSaveMutation } from '@/stores/queries/rigs';
import { RigForm } from './rig-form';
import { RigLoadsEditor } from './rig-loads-editor';

/** One of My rigs, edited without a trip: its parts (as on a trip's Rig tab) and its usual loads. */
export function SavedRigScreen({ rigId }: { rigId: string }) {
  const wide = useIsWide();
  const rigs = useMyRigsQuery();
  const save = useSavedRigSaveMutation(rigId);
  const record = rigs.data?.rigs.find((r) => r.id === rigId);
  const back = (
    <Link href="/rigs" testID="saved-rig-back" accessibilityLabel="Back to My rigs">
      <Text variant="label" color="pine">
        ‹ My rigs
      </Text>
    </Link>
  );
  if (rigs.isPending) return <Skeleton testID="saved-rig-loading" height={240} />;
  if (rigs.isError)
    return <QueryError testID="saved-rig-error" error={rigs.error} onRetry={() => void rigs.refetch()} />;
  if (!record)
    return (
      <Screen testID="saved-rig-screen" title="Rig not found">
        {back}
        <EmptyState testID="saved-rig-missing" title="No such rig" body="It may have been deleted." />
      </Screen>
    );
  return (
    <Screen testID="saved-rig-screen" title={record.rig.name} subtitle="One of My rigs">
      {back}
      <View style={[styles.panes, wide ? styles.panesWide : null]}>
        <View style={styles.main}>
          <RigForm
            key={record.id}
            save={save}
            record={record}
            canEdit
            dcLoads={dcLoadsFromAppliances(record.loads.map((load, i) => ({ ...load, id: `load-${i}` })))}
          />
        </View>
        <View style={wide ? styles.side : null}>
          <RigLoadsEditor record={record} />
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  panes: { gap: space.lg },
  panesWide: { flexDirection: 'row', alignItems: 'flex-start' },
  main: { flex: 1, minWidth: 0 },
  side: { width: 380 },
});
