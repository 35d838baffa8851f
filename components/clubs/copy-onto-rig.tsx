import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/stores/queries/api-client';
import { useCopyOntoRigMutation } from '@/stores/queries/clubs';
import { useMyRigsQuery } from '@/stores/queries/rigs';
import { showToast } from '@/stores/toast-store';

type Props = { tripId: string; tripName: string; onCancel: () => void };

/** Pick one of My rigs; the copy is a new trip I own, with the club's stops, drives and routines. */
export function CopyOntoRig({ tripId, tripName, onCancel }: Props) {
  const router = useRouter();
  const rigs = useMyRigsQuery();
  const copy = useCopyOntoRigMutation();
  const [picked, setPicked] = useState<string>();
  const [error, setError] = useState<string>();
  const testID = `copy-${tripId}`;
  if (rigs.isPending) return <Skeleton testID={`${testID}-loading`} height={48} />;
  if (rigs.isError)
    return <QueryError testID={`${testID}-error`} error={rigs.error} onRetry={() => void rigs.refetch()} />;
  if (rigs.data.rigs.length === 0)
    return (
      <View style={styles.wrap} testID={`${testID}-no-rigs`}>
        <Text color="inkSoft">
          You have no saved rig yet. Open one of your trips, go to its Rig tab and choose “Save to My rigs”; then come
          back and copy this plan onto it.
        </Text>
        <Button testID={`${testID}-cancel`} label="Close" tone="quiet" onPress={onCancel} style={styles.left} />
      </View>
    );
  const rigId = picked ?? rigs.data.rigs[0]?.id ?? '';
  const submit = async () => {
    setError(undefined);
    try {
      const rigName = rigs.data.rigs.find((record) => record.id === rigId)?.rig.name;
      // The copy sits in my list beside the club's plan: its name says which rig it runs on.
      const name = rigName ? `${tripName} (${rigName})`.slice(0, 120) : undefined;
      const detail = await copy.mutateAsync({ tripId, rigId, ...(name ? { name } : {}) });
      showToast(`${tripName} is now on your rig. Check its budget.`);
      router.push({ pathname: '/trips/[tripId]', params: { tripId: detail.trip.id } });
    } catch (failure) {
      setError(failure instanceof ApiError ? failure.message : 'Copying did not work. Please try again.');
    }
  };
  return (
    <View style={styles.wrap} testID={`${testID}-form`}>
      {error ? <Banner testID={`${testID}-failed`} message={error} /> : null}
      <ChoiceChips
        testID={`${testID}-rig`}
        label="Which of My rigs?"
        options={rigs.data.rigs.map((record) => ({ value: record.id, label: record.rig.name }))}
        value={rigId}
        onChange={setPicked}
      />
      <View style={styles.row}>
        <Button
          testID={`${testID}-submit`}
          label="Copy onto this rig"
          busy={copy.isPending}
          onPress={() => void submit()}
        />
        <Button testID={`${testID}-cancel`} label="Cancel" tone="quiet" onPress={onCancel} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  left: { alignSelf: 'flex-start' },
});
