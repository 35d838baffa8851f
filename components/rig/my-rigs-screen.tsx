import { Link, useRouter } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, space } from '@/components/theme/tokens';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { QueryError } from '@/components/ui/query-error';
import { Screen } from '@/components/ui/screen';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { SavedRigRecord } from '@/shared/schemas/api';
import { useMyRigsQuery } from '@/stores/queries/rigs';
import { NewRigForm } from './new-rig-form';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function RigCard({ record, wide }: { record: SavedRigRecord; wide: boolean }) {
  const { rig, loads } = record;
  const solarW = rig.solarArrays.reduce((sum, array) => sum + array.ratedW, 0);
  const summary = [
    `${rig.battery.capacityAh} Ah at ${rig.battery.nominalV} V`,
    solarW > 0 ? `${solarW} W solar` : 'no solar',
    plural(loads.length, 'usual load', 'usual loads'),
  ].join(' · ');
  return (
    <Link href={{ pathname: '/rigs/[rigId]', params: { rigId: record.id } }} asChild>
      <Pressable
        testID={`rig-card-${record.id}`}
        accessibilityRole="link"
        accessibilityLabel={`${rig.name}, ${summary}`}
        // Link's asChild needs one flat style object on the web.
        style={StyleSheet.flatten([styles.card, wide ? styles.cardWide : null])}
      >
        <Text variant="title">{rig.name}</Text>
        <Text color="inkSoft">{summary}</Text>
      </Pressable>
    </Link>
  );
}

/** My rigs: the power systems and usual loads a household brings to every trip, made and edited without a trip. */
export function MyRigsScreen() {
  const router = useRouter();
  const wide = useIsWide();
  const rigs = useMyRigsQuery();
  const none = rigs.data?.rigs.length === 0;
  return (
    <Screen
      testID="rigs-screen"
      title="My rigs"
      subtitle="Your battery, solar and charging, with the loads you usually run. Every trip and club plan starts on one."
    >
      {rigs.isPending ? <Skeleton testID="rigs-loading" height={120} /> : null}
      {rigs.isError ? <QueryError testID="rigs-error" error={rigs.error} onRetry={() => void rigs.refetch()} /> : null}
      {none ? (
        <EmptyState
          testID="rigs-empty"
          title="No rigs yet"
          body="Start one from a common rig or blank, then set its parts and the loads you usually run."
        />
      ) : null}
      {rigs.data && !none ? (
        <View style={styles.list} testID="rigs-list">
          {rigs.data.rigs.map((record) => (
            <RigCard key={record.id} record={record} wide={wide} />
          ))}
        </View>
      ) : null}
      <Card testID="new-rig-card">
        <Text variant="title" role="heading" aria-level={2}>
          New rig
        </Text>
        <NewRigForm
          testID="new-rig"
          onCreated={(record) => router.push({ pathname: '/rigs/[rigId]', params: { rigId: record.id } })}
        />
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: {
    flexGrow: 1,
    flexBasis: '100%',
    gap: space.xs,
    padding: space.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  cardWide: { flexBasis: 320 },
});
