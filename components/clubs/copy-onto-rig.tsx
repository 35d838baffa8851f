import { Link, useRouter } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { NewRigForm } from '@/components/rig/new-rig-form';
import { colors, radii, space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { QueryError } from '@/components/ui/query-error';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/stores/queries/api-client';
import { useCopyOntoRigMutation } from '@/stores/queries/clubs';
import { useMyRigsQuery } from '@/stores/queries/rigs';
import { useTripQuery } from '@/stores/queries/trips';
import { showToast } from '@/stores/toast-store';

type Props = { tripId: string; tripName: string; onCancel: () => void };

/**
 * Pick one of My rigs (or make one here) and tick which of the plan's shared loads to add: the copy is a new trip I
 * own, with the plan's stops and drives, my rig and its usual loads.
 */
export function CopyOntoRig({ tripId, tripName, onCancel }: Props) {
  const router = useRouter();
  const rigs = useMyRigsQuery();
  const copy = useCopyOntoRigMutation();
  const [picked, setPicked] = useState<string>();
  const [error, setError] = useState<string>();
  const plan = useTripQuery(tripId);
  const [shared, setShared] = useState<ReadonlySet<string>>(new Set());
  const testID = `copy-${tripId}`;
  if (rigs.isPending) return <Skeleton testID={`${testID}-loading`} height={48} />;
  if (rigs.isError)
    return <QueryError testID={`${testID}-error`} error={rigs.error} onRetry={() => void rigs.refetch()} />;
  if (rigs.data.rigs.length === 0)
    return (
      <View style={styles.wrap} testID={`${testID}-no-rigs`}>
        <Text color="inkSoft">
          First, your own rig: start it from a common rig or blank. You can set its parts and usual loads in My rigs at
          any time.
        </Text>
        <NewRigForm
          testID={`${testID}-new-rig`}
          submitLabel="Create my rig"
          onCreated={(record) => setPicked(record.id)}
        />
        <Link href="/rigs" testID={`${testID}-go-rigs`} accessibilityLabel="Open My rigs">
          <Text variant="label" color="pine">
            Open My rigs ›
          </Text>
        </Link>
        <Button testID={`${testID}-cancel`} label="Close" tone="quiet" onPress={onCancel} style={styles.left} />
      </View>
    );
  const rigId = rigs.data.rigs.find((record) => record.id === picked)?.id ?? rigs.data.rigs[0]?.id ?? '';
  const chosen = rigs.data.rigs.find((record) => record.id === rigId);
  const planLoads = plan.data?.appliances ?? [];
  const submit = async () => {
    setError(undefined);
    try {
      const rigName = rigs.data.rigs.find((record) => record.id === rigId)?.rig.name;
      // The copy sits in my list beside the club's plan: its name says which rig it runs on.
      const name = rigName ? `${tripName} (${rigName})`.slice(0, 120) : undefined;
      const detail = await copy.mutateAsync({
        tripId,
        rigId,
        sharedApplianceIds: [...shared],
        ...(name ? { name } : {}),
      });
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
      <Text variant="caption" color="inkSoft" testID={`${testID}-rig-loads`}>
        {chosen && chosen.loads.length > 0
          ? `Your loads come from this rig: ${chosen.loads.map((load) => load.name).join(', ')}.`
          : 'This rig has no usual loads yet: add them in My rigs, or on the copy’s Loads tab.'}
      </Text>
      {planLoads.length > 0 ? (
        <View style={styles.ticks} role="group" aria-label="Shared loads from the plan to add">
          <Text variant="label">Add any of the plan’s shared loads?</Text>
          <Text variant="caption" color="inkSoft">
            Only what you tick comes along (a rally’s shared lights, say); the organiser’s own appliances stay theirs.
          </Text>
          {planLoads.map(({ appliance }) => {
            const on = shared.has(appliance.id);
            return (
              <Pressable
                key={appliance.id}
                testID={`${testID}-share-${appliance.id}`}
                role="checkbox"
                aria-checked={on}
                accessibilityLabel={`Add ${appliance.name} (${appliance.runningW} W)`}
                onPress={() => {
                  const next = new Set(shared);
                  if (on) next.delete(appliance.id);
                  else next.add(appliance.id);
                  setShared(next);
                }}
                style={styles.tick}
              >
                <View style={[styles.box, on ? styles.boxOn : null]}>
                  {on ? (
                    <Text variant="caption" color="white">
                      ✓
                    </Text>
                  ) : null}
                </View>
                <Text>
                  {appliance.name} · {appliance.runningW} W
                </Text>
              </Pressable>
            );
          })}
        </View>
      ) : null}
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
  ticks: { gap: space.sm },
  tick: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 44 },
  box: {
    width: 24,
    height: 24,
    borderRadius: radii.sm / 2,
    borderWidth: 2,
    borderColor: colors.pine,
    alignItems: 'center',
    justifyContent: 'center',
  },
  boxOn: { backgroundColor: colors.pine },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  left: { alignSelf: 'flex-start' },
});
