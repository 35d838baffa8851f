import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { localMoment } from '@/components/format/time';
import { failureMessage } from '@/components/trip/use-apply-edit';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import type { TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { can } from '@/shared/schemas/roles';
import { MOST_NIGHTS_CHANGED, type StayMode } from '@/shared/schemas/stay';
import { useStayChangeMutation } from '@/stores/queries/stay';
import { showToast } from '@/stores/toast-store';
import { currentStopIndex, stayOutcome } from './stay-what-if';
import { UnsavedWhatIf } from './unsaved-what-if';

const MODES: { value: StayMode; label: string }[] = [
  { value: 'shift-rest', label: 'Move the rest of the trip' },
  { value: 'next-stop', label: 'Take from the next stop' },
];

const nightsText = (n: number) => `${n > 0 ? '+' : '−'}${Math.abs(n)} night${Math.abs(n) === 1 ? '' : 's'}`;

/** One control on the current stop: nights more or fewer, the budget at once as a what-if, then keep or discard. */
export function StayControl({ detail, checkIns }: { detail: TripDetail; checkIns: readonly CheckInRecord[] }) {
  const [nights, setNights] = useState(0);
  const [mode, setMode] = useState<StayMode>('shift-rest');
  const save = useStayChangeMutation(detail.trip.id);
  const index = currentStopIndex(detail, checkIns, new Date());
  const stop = detail.stops[index];
  if (!stop) return null;
  const canKeep = can(detail.trip.role, 'editTrip');
  const planned = stayOutcome(detail, checkIns, index, 0, mode);
  const changed = nights === 0 ? null : stayOutcome(detail, checkIns, index, nights, mode);
  const pct = (v: number) => `${Math.round(v)} %`;

  const keep = async () => {
    try {
      await save.mutateAsync({ stopId: stop.id, tripVersion: detail.trip.version, nights, mode });
      showToast(`Saved: ${nightsText(nights)} at ${stop.stop.name}`);
      setNights(0);
    } catch (error) {
      showToast(failureMessage(error, 'change'), { tone: 'danger' });
    }
  };

  return (
    <Card testID="stay-control">
      <Text variant="title" role="heading" aria-level={2}>
        Stay longer or leave early
      </Text>
      <Text color="inkSoft">
        At {stop.stop.name}, leaving {localMoment(stop.stop.departAt)}
      </Text>
      <View style={styles.stepper}>
        <Button
          testID="stay-fewer"
          label="−"
          tone="secondary"
          accessibilityLabel="One night fewer"
          disabled={nights <= -MOST_NIGHTS_CHANGED}
          onPress={() => setNights((n) => n - 1)}
        />
        <Text variant="figure" testID="stay-nights" style={styles.nights}>
          {nights === 0 ? 'As planned' : nightsText(nights)}
        </Text>
        <Button
          testID="stay-more"
          label="+"
          tone="secondary"
          accessibilityLabel="One night more"
          disabled={nights >= MOST_NIGHTS_CHANGED}
          onPress={() => setNights((n) => n + 1)}
        />
      </View>
      <ChoiceChips testID="stay-mode" label="What gives way" options={MODES} value={mode} onChange={setMode} />
      <Text variant="caption" color="inkSoft">
        {mode === 'shift-rest'
          ? 'Every later stop moves by the same nights: the trip ends later (or earlier).'
          : 'The next stop gets fewer nights (or more): the rest of the trip keeps its dates.'}
      </Text>
      {changed ? (
        <UnsavedWhatIf
          testID="stay-what-if"
          save={{
            testID: 'stay-keep',
            label: 'Keep',
            busy: save.isPending,
            disabled: !canKeep || !changed.ok,
            onPress: () => void keep(),
          }}
          discard={{ testID: 'stay-discard', onPress: () => setNights(0) }}
          refusal={canKeep ? null : 'Only the trip owner or a planner can move stops.'}
        >
          {changed.ok && planned.ok ? (
            <Text variant="label">
              What-if: lowest {changed.fromCheckIn ? 'ahead ' : ''}
              {pct(changed.lowestSocPct)} on {localMoment(changed.lowestAtLocal)} (now {pct(planned.lowestSocPct)})
            </Text>
          ) : (
            <Text color="emberInk" testID="stay-error">
              {changed.ok ? '' : changed.message}
            </Text>
          )}
          <Text variant="caption" color="inkSoft">
            Not saved yet. Keep it to move the stops, or discard it.
          </Text>
        </UnsavedWhatIf>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  stepper: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  nights: { flexShrink: 1, textAlign: 'center', minWidth: 120 },
});
