import { useEffect, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { failureMessage, useApplyEdit } from '@/components/trip/use-apply-edit';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Skeleton } from '@/components/ui/skeleton';
import { Text } from '@/components/ui/text';
import type { Calibration } from '@/shared/engine/calibrate';
import type { TripDetail } from '@/shared/schemas/api';
import type { CheckInRecord } from '@/shared/schemas/check-in';
import { can } from '@/shared/schemas/roles';
import { useApplyCalibrationMutation } from '@/stores/queries/calibration';
import { showToast } from '@/stores/toast-store';
import {
  calibrationOfferFor,
  calibrationRequest,
  calibrationView,
  fitInSlices,
  undoCalibration,
  type CalibrationSide,
  type CalibrationView,
} from './calibration-offer';
import { UnsavedWhatIf } from './unsaved-what-if';

/** Closed, fitting, or showing a fit; each open state names the offer it was made for, so a stale one reads closed. */
type Step =
  | { kind: 'closed' }
  | { kind: 'fitting'; key: string }
  | { kind: 'fitted'; key: string; fit: Calibration | undefined; view: CalibrationView | null };

const ROWS: { field: keyof CalibrationSide; label: string }[] = [
  { field: 'openness', label: 'Sky openness' },
  { field: 'loads', label: 'Loads' },
  { field: 'fitError', label: 'Fit error (RMS)' },
  { field: 'lowestAhead', label: 'Forecast from your latest check-in' },
];

/**
 * "Use what we saw": when the readings at the current stop disagree with the plan, offer to fit the stop's sky
 * openness and a scale on the loads to them, show the before and after, and save it only when accepted (with Undo).
 */
export function CalibrateCard({ detail, checkIns }: { detail: TripDetail; checkIns: readonly CheckInRecord[] }) {
  const [step, setStep] = useState<Step>({ kind: 'closed' });
  const running = useRef<AbortController | null>(null);
  const save = useApplyCalibrationMutation(detail.trip.id);
  const { offerUndo } = useApplyEdit(detail);
  useEffect(() => () => running.current?.abort(), []);

  const offer = calibrationOfferFor(detail, checkIns);
  if (offer.kind === 'none') return null;
  const current: Step = step.kind !== 'closed' && step.key === offer.key ? step : { kind: 'closed' };
  const canAccept = can(detail.trip.role, 'editTrip');

  const open = () => {
    running.current?.abort();
    const controller = new AbortController();
    running.current = controller;
    setStep({ kind: 'fitting', key: offer.key });
    fitInSlices(offer, controller.signal).then(
      // The before/after walks the plan twice more: once, here, not on every render.
      (fit) =>
        setStep({
          kind: 'fitted',
          key: offer.key,
          fit,
          view: fit ? calibrationView(fit, offer.input, checkIns) : null,
        }),
      () => undefined, // stopped by Discard or by leaving the screen
    );
  };
  const discard = () => {
    running.current?.abort();
    setStep({ kind: 'closed' });
  };
  const accept = async (fit: Calibration) => {
    const body = calibrationRequest(detail, fit);
    if (!body) return;
    try {
      const saved = await save.mutateAsync(body);
      const undo = undoCalibration(detail, saved, body.stopId);
      if (undo) offerUndo(undo, `calibrated ${offer.stopName} from check-ins`);
      setStep({ kind: 'closed' });
    } catch (error) {
      showToast(failureMessage(error, 'calibration'), { tone: 'danger' });
    }
  };

  const view = current.kind === 'fitted' ? current.view : null;
  return (
    <Card testID="calibrate-card">
      <Text variant="title" role="heading" aria-level={2}>
        Use what we saw
      </Text>
      <Text color="inkSoft" testID="calibrate-reason">
        Your check-ins at {offer.stopName} miss the plan by {offer.rmsPct.toFixed(1)} % of the bank (RMS).
      </Text>
      {current.kind === 'closed' ? (
        <Button
          testID="calibrate-open"
          label="Calibrate from check-ins"
          tone="secondary"
          accessibilityLabel={`Calibrate ${offer.stopName} from check-ins`}
          onPress={open}
        />
      ) : null}
      {current.kind === 'fitting' ? (
        <View style={styles.panel} aria-live="polite">
          <Text variant="label">Fitting the sky and the loads to your check-ins…</Text>
          <Skeleton testID="calibrate-fitting" height={96} />
          <Button testID="calibrate-cancel" label="Cancel" tone="secondary" onPress={discard} />
        </View>
      ) : null}
      {current.kind === 'fitted' ? (
        <UnsavedWhatIf
          testID="calibrate-result"
          save={{
            testID: 'calibrate-accept',
            label: 'Accept',
            busy: save.isPending,
            disabled: !canAccept || !current.fit,
            onPress: () => current.fit && void accept(current.fit),
          }}
          discard={{ testID: 'calibrate-discard', onPress: discard }}
          refusal={canAccept ? null : "Only the trip owner or a planner can change a stop's sky."}
        >
          {view ? (
            <>
              {ROWS.map(({ field, label }) => (
                <View key={field} style={styles.row} testID={`calibrate-${field}`}>
                  <Text variant="caption" color="inkSoft">
                    {label}
                  </Text>
                  <Text testID={`calibrate-${field}-before`}>Now: {view.before[field]}</Text>
                  <Text variant="label" testID={`calibrate-${field}-after`}>
                    Calibrated: {view.after[field]}
                  </Text>
                </View>
              ))}
              <Text variant="caption" color="inkSoft">
                Accept sets {offer.stopName} to the fitted sky openness and scales every appliance&apos;s running and
                standby watts. Not saved yet.
              </Text>
            </>
          ) : (
            <Text color="emberInk">These check-ins are too few to fit the sky and the loads.</Text>
          )}
        </UnsavedWhatIf>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  panel: { padding: space.md, borderRadius: radii.md, backgroundColor: colors.infoSoft, gap: space.md },
  // Space between the four figures, so each now/calibrated pair reads as one.
  row: { gap: space.xs, paddingBottom: space.sm },
});
