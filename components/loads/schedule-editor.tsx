import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { simulateCached } from '@/components/budget/simulate-cached';
import { percent, temperature, text } from '@/components/format/units';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { ConflictNotice } from '@/components/ui/conflict-notice';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { TimeOfDayField } from '@/components/ui/time-of-day-field';
import { COOLING_COP, ELECTRIC_HEATER_EFFICIENCY, FUEL_HEATER_EFFICIENCY } from '@/shared/engine/climate';
import type { ApplianceRecord, TripDetail } from '@/shared/schemas/api';
import { scheduleSchema, type Schedule } from '@/shared/schemas/appliance';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { fromDisplay, toDisplay } from '@/shared/units';
import { conflictCurrent } from '@/stores/queries/api-client';
import { useScheduleSaveMutation, type ScheduleSave } from '@/stores/queries/appliances';
import { keptForLater, queuedSaveKeys, useQueuedConflict, useSaveWaiting } from '@/stores/queries/offline-queue';
import { useBudgetQuery } from '@/stores/queries/budget';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { describeWindow, setLength, setStart, stripOf, type StripKey } from './routine-cells';
import { RoutineStrip } from './routine-strip';

type Props = { detail: TripDetail; record: ApplianceRecord; canEdit: boolean };

/** What the efficiency means and the figure used when it is left empty. */
export function thermostatEfficiencyHint(mode: 'cooling' | 'heating', circuit: 'ac' | 'dc' | 'fuel'): string {
  if (mode === 'cooling') return `heat removed per unit of electricity (EER ÷ 3.41); empty: ${COOLING_COP}`;
  const typical = circuit === 'fuel' ? FUEL_HEATER_EFFICIENCY : ELECTRIC_HEATER_EFFICIENCY;
  return `share of its ${circuit === 'fuel' ? 'propane' : 'electricity'} that heats the cabin; empty: ${typical * 100} %`;
}

const STRIPS: { value: StripKey; label: string }[] = [
  { value: 'all', label: 'Every day' },
  { value: 'camp', label: 'Camp days' },
  { value: 'travel', label: 'Travel days' },
];

/** The routine editor; changes are a draft (with a live estimate) until "Save routine". */
export function ScheduleEditor({ detail, record, canEdit }: Props) {
  const units = useUnits();
  const tripId = detail.trip.id;
  const save = useScheduleSaveMutation();
  const budget = useBudgetQuery(detail.trip.id);
  const [draft, setDraft] = useState<Schedule>(record.appliance.schedule);
  const [base, setBase] = useState({ id: record.id, version: record.version, schedule: record.appliance.schedule });
  // Open on the first day type that has windows, so a camp-days-only routine is not shown as empty.
  const [strip, setStrip] = useState<StripKey>(() => {
    const s = record.appliance.schedule;
    const ws = s.kind === 'routine' ? s.windows : s.kind === 'thermostat' ? (s.activeWindows ?? []) : [];
    return STRIPS.find((o) => ws.some((w) => stripOf(w.days) === o.value))?.value ?? 'all';
  });
  const isThisAppliance = (v: ScheduleSave) => v.applianceId === record.id;
  const queuedConflict = useQueuedConflict<ScheduleSave, ApplianceRecord>(
    queuedSaveKeys.applianceSchedule,
    isThisAppliance,
  );
  const conflict = queuedConflict?.theirs ?? null;
  const waiting = useSaveWaiting<ScheduleSave>(queuedSaveKeys.applianceSchedule, isThisAppliance);
  const dirty = JSON.stringify(draft) !== JSON.stringify(base.schedule);
  // A routine refused after this editor was closed (sent from the queue) comes back as it was set.
  const [shownConflict, setShownConflict] = useState<ScheduleSave | null>(null);
  if (queuedConflict && queuedConflict.mine !== shownConflict) {
    setShownConflict(queuedConflict.mine);
    if (!dirty) setDraft(queuedConflict.mine.schedule);
  }
  // A newer record from the server replaces the draft only while nothing is being edited; otherwise the
  // save names the version the draft started from and a conflict asks the user.
  if ((base.id !== record.id || base.version !== record.version) && !dirty && !conflict) {
    setBase({ id: record.id, version: record.version, schedule: record.appliance.schedule });
    setDraft(record.appliance.schedule);
  }
  const valid = scheduleSchema.safeParse(draft);

  const input =
    dirty && valid.success
      ? toEngineInput({
          ...detail,
          appliances: detail.appliances.map((a) =>
            a.id === record.id ? { ...a, appliance: { ...a.appliance, schedule: valid.data } } : a,
          ),
        })
      : null;
  const preview = input ? simulateCached(input).result : null;
  const before = budget.data?.result?.headline.lowestSocPct;

  const rebase = (saved: ApplianceRecord) =>
    setBase({ id: saved.id, version: saved.version, schedule: saved.appliance.schedule });

  const submit = async (version: number) => {
    if (!valid.success) return;
    queuedConflict?.settle();
    const sent = save.mutateAsync({ tripId, applianceId: record.id, version, schedule: valid.data });
    if (keptForLater(sent, rebase)) {
      showToast(`Routine for ${record.appliance.name} kept on this device; it is sent when you are back online.`);
      return;
    }
    try {
      rebase(await sent);
      showToast(`Routine saved for ${record.appliance.name}`);
    } catch (error) {
      // A 409 is shown from the queue's record of it, with the routine as it was set.
      if (!conflictCurrent(error))
        showToast(error instanceof Error ? error.message : 'The routine could not be saved.', { tone: 'danger' });
    }
  };

  const windows =
    draft.kind === 'routine' ? draft.windows : draft.kind === 'thermostat' ? (draft.activeWindows ?? []) : [];
  const setWindows = (w: typeof windows) => {
    if (draft.kind === 'routine') setDraft({ ...draft, windows: w });
    else if (draft.kind === 'thermostat') setDraft({ ...draft, activeWindows: w.length > 0 ? w : undefined });
  };
  const stripWindows = windows.map((w, i) => ({ w, i })).filter(({ w }) => stripOf(w.days) === strip);

  return (
    <View style={styles.wrap} testID="schedule-editor">
      <Text variant="title" role="heading" aria-level={3}>
        When it runs
      </Text>
      <ChoiceChips
        testID="schedule-kind"
        label="Runs"
        disabled={!canEdit}
        value={draft.kind}
        options={[
          { value: 'routine', label: 'On a routine' },
          { value: 'always', label: 'All the time' },
          { value: 'thermostat', label: 'By temperature' },
        ]}
        onChange={(kind) =>
          setDraft(
            kind === 'always'
              ? { kind: 'always' }
              : kind === 'thermostat'
                ? { kind: 'thermostat', mode: 'heating', setPointC: 18 }
                : { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 19, startMinute: 0, minutes: 60 }] },
          )
        }
      />
      {draft.kind === 'thermostat' ? (
        <View style={styles.fields}>
          <ChoiceChips
            testID="thermostat-mode"
            label="Mode"
            disabled={!canEdit}
            value={draft.mode}
            options={[
              { value: 'heating', label: 'Heating' },
              { value: 'cooling', label: 'Cooling' },
            ]}
            onChange={(mode) => setDraft({ ...draft, mode })}
          />
          <NumberField
            testID="thermostat-set-point"
            label={draft.mode === 'heating' ? 'Heat below' : 'Cool above'}
            unit={temperature(0, units).unit}
            editable={canEdit}
            value={Math.round(toDisplay(draft.setPointC, 'temperature', units).value)}
            onChangeNumber={(v) =>
              v !== null && setDraft({ ...draft, setPointC: fromDisplay(v, 'temperature', units) })
            }
            error={valid.success ? undefined : valid.error.issues.find((i) => i.path.includes('setPointC'))?.message}
          />
          <NumberField
            testID="thermostat-efficiency"
            label={draft.mode === 'cooling' ? 'Cooling efficiency (COP)' : 'Heater efficiency'}
            unit={draft.mode === 'cooling' ? undefined : '%'}
            hint={thermostatEfficiencyHint(draft.mode, record.appliance.circuit)}
            editable={canEdit}
            value={
              draft.efficiency === undefined
                ? undefined
                : draft.mode === 'cooling'
                  ? draft.efficiency
                  : Math.round(draft.efficiency * 100)
            }
            onChangeNumber={(v) => {
              const { efficiency: _typical, ...rest } = draft;
              setDraft(
                v === null ? rest : { ...draft, efficiency: draft.mode === 'cooling' ? v : Math.round(v * 10) / 1000 },
              );
            }}
            error={valid.success ? undefined : valid.error.issues.find((i) => i.path.includes('efficiency'))?.message}
          />
          <Text variant="caption" color="inkSoft">
            Optionally limit it to the hours below (for example while someone is aboard); leave them empty to follow the
            temperature all day.
          </Text>
        </View>
      ) : null}
      {draft.kind !== 'always' ? (
        <>
          <ChoiceChips
            testID="routine-strip-kind"
            label="Day type"
            value={strip}
            options={STRIPS.map((o) => {
              const n = windows.filter((w) => stripOf(w.days) === o.value).length;
              return { value: o.value, label: n > 0 ? `${o.label} (${n})` : o.label };
            })}
            onChange={setStrip}
          />
          <RoutineStrip
            testID="routine-strip"
            windows={windows}
            strip={strip}
            disabled={!canEdit}
            onChange={setWindows}
          />
          {stripWindows.map(({ w, i }, k) => (
            // Keyed by position: a key from the start time would remount the row, and lose focus, as it changes.
            <View key={k} style={styles.window} testID={`window-${k}`}>
              <Text variant="label" testID={`window-${k}-words`}>
                {describeWindow(w)}
              </Text>
              <View style={styles.windowFields}>
                <View style={styles.windowField}>
                  <TimeOfDayField
                    testID={`window-start-${k}`}
                    label="Starts"
                    editable={canEdit}
                    hour={w.startHour}
                    minute={w.startMinute ?? 0}
                    onChange={(hour, minute) => setWindows(setStart(windows, i, hour, minute))}
                  />
                </View>
                <View style={styles.windowField}>
                  <NumberField
                    testID={`window-minutes-${k}`}
                    label="Lasts"
                    unit="min"
                    editable={canEdit}
                    value={w.minutes}
                    onChangeNumber={(v) => v !== null && v > 0 && setWindows(setLength(windows, i, v))}
                  />
                </View>
              </View>
            </View>
          ))}
          {windows.some((w) => stripOf(w.days) === null) ? (
            <Text variant="caption" color="inkSoft">
              This routine also has windows on particular trip days; they are kept as they are.
            </Text>
          ) : null}
        </>
      ) : null}
      {!valid.success && draft.kind === 'routine' ? (
        <Text variant="caption" color="ember" role="alert">
          Light at least one hour, or choose “All the time”.
        </Text>
      ) : null}
      {preview ? (
        <View style={styles.preview} testID="routine-preview">
          {stripWindows.length > 0 ? (
            <Text variant="caption" testID="routine-preview-words">
              Runs {stripWindows.map(({ w }) => describeWindow(w)).join('; ')}.
            </Text>
          ) : null}
          <Text variant="label">
            Lowest charge with this routine: {text(percent(preview.headline.lowestSocPct))}
            {before !== undefined ? ` (saved plan: ${text(percent(before))})` : ''}
          </Text>
          <Text variant="caption" color="inkSoft" testID="routine-preview-state">
            {waiting ? 'Kept on this device: waiting to sync.' : 'Not saved yet.'}
          </Text>
        </View>
      ) : null}
      {conflict ? (
        <ConflictNotice
          testID="schedule-conflict"
          what="appliance"
          theirVersion={conflict.version}
          busy={save.isPending && !waiting}
          onKeepMine={() => void submit(conflict.version)}
          onTakeTheirs={() => {
            rebase(conflict);
            setDraft(conflict.appliance.schedule);
            queuedConflict?.settle();
          }}
        />
      ) : null}
      {canEdit ? (
        <View style={styles.actions}>
          <Button
            testID="schedule-save"
            label="Save routine"
            busy={save.isPending && !waiting}
            disabled={!dirty || !valid.success || waiting}
            onPress={() => void submit(base.version)}
          />
          {dirty ? (
            <Button testID="schedule-reset" label="Undo changes" tone="quiet" onPress={() => setDraft(base.schedule)} />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  fields: { gap: space.md },
  window: { gap: space.sm, padding: space.md, borderRadius: radii.md, borderWidth: 1, borderColor: colors.line },
  windowFields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  windowField: { flexGrow: 1, flexBasis: 130 },
  preview: { padding: space.md, borderRadius: radii.md, backgroundColor: colors.pineSoft, gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
