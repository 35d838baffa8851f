import { DateTime } from 'luxon';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { ConflictNotice } from '@/components/ui/conflict-notice';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { checkInFieldsSchema, type CheckInRecord } from '@/shared/schemas/check-in';
import type { PropaneTank } from '@/shared/schemas/rig';
import { ApiError, conflictCurrent } from '@/stores/queries/api-client';
import { useCheckInSaveMutation, type CheckInSave } from '@/stores/queries/check-ins';
import {
  keptForLater,
  queuedSaveKeys,
  savesWait,
  useQueuedConflict,
  useSaveWaiting,
} from '@/stores/queries/offline-queue';
import { draftFromRecord, draftToFields, emptyDraft, type CheckInDraft, type CylinderChoice } from './check-in-draft';

const CHOICES: { value: CylinderChoice; label: string }[] = [
  { value: 'unread', label: 'Not read' },
  { value: 'full', label: 'Full' },
  { value: 'part', label: 'Part' },
  { value: 'weight', label: 'Weighed' },
];

type Props = {
  tripId: string;
  tanks: readonly PropaneTank[];
  /** A reading being changed; absent for a new one. */
  editing?: CheckInRecord;
  onDone?: () => void;
};

/** "Check in": today's charge from the battery monitor, optionally propane, yesterday's harvest and a note. */
export function CheckInForm({ tripId, tanks, editing, onDone }: Props) {
  const [draft, setDraft] = useState<CheckInDraft>(() =>
    editing ? draftFromRecord(editing, tanks.length) : emptyDraft(tanks.length),
  );
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [outcome, setOutcome] = useState<'saved' | 'kept' | null>(null);
  const [touched, setTouched] = useState(false);
  const save = useCheckInSaveMutation();
  const isThisReading = (v: CheckInSave) => !!editing && v.checkInId === editing.id;
  const conflict = useQueuedConflict<CheckInSave, CheckInRecord>(queuedSaveKeys.checkIn, isThisReading);
  const waiting = useSaveWaiting<CheckInSave>(queuedSaveKeys.checkIn, isThisReading);
  const theirs = conflict?.theirs ?? null;
  // A change refused after the form was closed (sent from the queue) comes back as it was typed.
  const [shownConflict, setShownConflict] = useState<CheckInSave | null>(null);
  if (conflict && conflict.mine !== shownConflict) {
    setShownConflict(conflict.mine);
    if (!touched) {
      const mine = checkInFieldsSchema.parse(conflict.mine.checkIn);
      const at = mine.at ?? conflict.theirs.checkIn.at;
      setDraft(draftFromRecord({ ...conflict.theirs, checkIn: { ...mine, at } }, tanks.length));
    }
  }
  const zone = DateTime.local().zoneName ?? 'UTC';
  const set = (change: Partial<CheckInDraft>) => {
    setOutcome(null);
    setTouched(true);
    setDraft((d) => ({ ...d, ...change }));
  };

  const submit = async (version = editing?.version) => {
    const result = draftToFields(draft, zone);
    if (!result.ok) {
      setErrors(result.errors);
      return;
    }
    setErrors({});
    conflict?.settle();
    // A reading kept for later is stamped now: "now" on the server would be when the signal came back.
    const queued = savesWait();
    const checkIn =
      queued && !result.fields.at
        ? { ...result.fields, at: DateTime.now().toISO({ suppressMilliseconds: true, suppressSeconds: true }) }
        : result.fields;
    const sent = save.mutateAsync({ tripId, checkInId: editing?.id ?? null, version, checkIn });
    if (keptForLater(sent)) {
      setOutcome('kept');
      if (!editing) setDraft(emptyDraft(tanks.length));
      return;
    }
    try {
      await sent;
      setOutcome('saved');
      setTouched(false);
      if (!editing) setDraft(emptyDraft(tanks.length));
      onDone?.();
    } catch (error) {
      // A 409 is shown from the queue's record of it (below), with what was typed.
      if (!conflictCurrent(error) && error instanceof ApiError)
        setErrors({
          form: error.message,
          ...Object.fromEntries(
            Object.entries(error.fields ?? {}).map(([k, v]) => [k.replace(/^checkIn\./, ''), v[0] ?? '']),
          ),
        });
    }
  };

  return (
    <Card testID={editing ? 'check-in-edit-form' : 'check-in-form'}>
      <Text variant="title" role="heading" aria-level={2}>
        {editing ? 'Change this check-in' : 'Check in'}
      </Text>
      <NumberField
        testID="check-in-soc"
        label="State of charge on the battery monitor"
        unit="%"
        value={draft.socPct}
        onChangeNumber={(socPct) => set({ socPct })}
        error={errors.socPct}
      />
      <TextField
        testID="check-in-time"
        label="Time"
        hint="Leave blank for now, or write e.g. 2027-09-14 18:00 (this phone's time)."
        placeholder="Now"
        value={draft.time}
        onChangeText={(time) => set({ time })}
        error={errors.time ?? errors.at}
      />
      {tanks.map((tank, i) => {
        const c = draft.cylinders[i] ?? { choice: 'unread' as const, amount: null };
        const setCylinder = (next: Partial<typeof c>) =>
          set({ cylinders: draft.cylinders.map((old, k) => (k === i ? { ...old, ...next } : old)) });
        return (
          <View key={`${tank.name}-${i}`} style={styles.cylinder}>
            <ChoiceChips
              testID={`check-in-cylinder-${i}`}
              label={`Propane left in ${tank.name} (${tank.propaneKg} kg)`}
              options={CHOICES}
              value={c.choice}
              onChange={(choice) => setCylinder({ choice })}
            />
            {c.choice === 'part' || c.choice === 'weight' ? (
              <NumberField
                testID={`check-in-cylinder-${i}-amount`}
                label={c.choice === 'part' ? 'About how full' : 'Propane left, without the cylinder'}
                unit={c.choice === 'part' ? '%' : 'kg'}
                value={c.amount}
                onChangeNumber={(amount) => setCylinder({ amount })}
                error={errors[`cylinder${i}`]}
              />
            ) : null}
          </View>
        );
      })}
      <NumberField
        testID="check-in-harvest"
        label="Yesterday's harvest from the charge controller (optional)"
        unit="Wh"
        value={draft.harvestWh}
        onChangeNumber={(harvestWh) => set({ harvestWh })}
        error={errors.harvestWh}
      />
      <TextField
        testID="check-in-note"
        label="Note (optional)"
        placeholder="Fan ran all night"
        value={draft.note}
        onChangeText={(note) => set({ note })}
        error={errors.note}
        multiline
      />
      {errors.form ? (
        <Text color="emberInk" role="alert" testID="check-in-error">
          {errors.form}
        </Text>
      ) : null}
      {theirs ? (
        <ConflictNotice
          testID="check-in-conflict"
          what="check-in"
          theirVersion={theirs.version}
          theirs={[`${Math.round(theirs.checkIn.socPct)} %`, theirs.checkIn.note].filter(Boolean)}
          busy={save.isPending && !waiting}
          onKeepMine={() => void submit(theirs.version)}
          onTakeTheirs={() => {
            setDraft(draftFromRecord(theirs, tanks.length));
            setTouched(false);
            conflict?.settle();
          }}
        />
      ) : null}
      <View style={styles.row}>
        <Button
          testID="check-in-save"
          label={editing ? 'Save the change' : 'Check in'}
          busy={save.isPending && !save.isPaused}
          onPress={() => void submit()}
        />
        {editing && onDone ? (
          <Button testID="check-in-cancel" label="Cancel" tone="secondary" onPress={onDone} />
        ) : null}
      </View>
      {outcome === 'saved' ? (
        <Text color="pine" role="status" testID="check-in-saved">
          Saved. The forecast now starts from this reading if it is your latest.
        </Text>
      ) : null}
      {outcome === 'kept' || waiting ? (
        <Text color="lakeInk" role="status" testID="check-in-kept">
          Kept on this phone: it is sent when you are back online.
        </Text>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  cylinder: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
