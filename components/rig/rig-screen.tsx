import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Panes, TabScroll } from '@/components/trip/tab-scroll';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { dcLoadsFromAppliances } from '@/shared/engine/dc-run-defaults';
import type { TripDetail } from '@/shared/schemas/api';
import { can } from '@/shared/schemas/roles';
import { ApiError } from '@/stores/queries/api-client';
import {
  useMyRigsQuery,
  useTripRigCopyToMineMutation,
  useTripRigReplaceMutation,
  useTripRigSaveMutation,
} from '@/stores/queries/rigs';
import { showToast } from '@/stores/toast-store';
import { RigForm } from './rig-form';

function MyRigs({ detail }: { detail: TripDetail }) {
  const mine = useMyRigsQuery();
  const copy = useTripRigCopyToMineMutation(detail.trip.id);
  const replace = useTripRigReplaceMutation(detail.trip.id);
  const [name, setName] = useState(detail.rig.rig.name);
  const fail = (error: unknown) =>
    showToast(error instanceof ApiError ? error.message : 'That did not work.', { tone: 'danger' });
  return (
    <Card testID="my-rigs">
      <Text variant="title" role="heading" aria-level={2}>
        My rigs
      </Text>
      <Text variant="caption" color="inkSoft">
        Keep this rig for other trips, or put one of yours on this trip (it replaces the rig above).
      </Text>
      <TextField
        testID="rig-save-name"
        label="Save this rig as"
        value={name}
        onChangeText={setName}
        error={name.trim() ? undefined : 'Give it a name.'}
      />
      <Button
        testID="rig-save-to-mine"
        tone="secondary"
        label="Save to My rigs"
        busy={copy.isPending}
        disabled={!name.trim()}
        onPress={() => copy.mutateAsync(name.trim()).then(() => showToast(`Saved “${name.trim()}” to My rigs`), fail)}
      />
      {mine.isPending ? <Skeleton height={48} /> : null}
      {mine.data?.rigs.length === 0 ? <Text color="inkSoft">No saved rigs yet.</Text> : null}
      {mine.data?.rigs.map((r) => (
        <View key={r.id} style={styles.row}>
          <Text variant="label" style={styles.name}>
            {r.rig.name}
          </Text>
          <Button
            testID={`rig-replace-${r.id}`}
            tone="quiet"
            label="Use on this trip"
            accessibilityLabel={`Use ${r.rig.name} on this trip`}
            busy={replace.isPending && replace.variables?.rigId === r.id}
            onPress={() =>
              replace
                .mutateAsync({ version: detail.rig.version, rigId: r.id })
                .then(() => showToast(`${r.rig.name} is now this trip's rig`), fail)
            }
          />
        </View>
      ))}
    </Card>
  );
}

export function RigScreen({ detail }: { detail: TripDetail }) {
  const canEdit = can(detail.trip.role, 'editTrip');
  const save = useTripRigSaveMutation(detail.trip.id);
  return (
    <TabScroll testID="rig-screen">
      {!canEdit ? (
        <Banner testID="rig-read-only" tone="info" message="Only the trip owner or a planner can change the rig." />
      ) : null}
      <Panes
        main={
          <RigForm
            key={detail.rig.id}
            save={save}
            record={detail.rig}
            canEdit={canEdit}
            dcLoads={dcLoadsFromAppliances(detail.appliances.map((a) => a.appliance))}
          />
        }
        side={canEdit ? <MyRigs detail={detail} /> : <View />}
        sideWidth={380}
      />
    </TabScroll>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  name: { flex: 1 },
});
