import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { FieldSlot } from '@/components/forms/field-slot';
import { FormTextField } from '@/components/forms/form-text-field';
import { showServerRefusal } from '@/components/forms/server-refusal';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { ConflictNotice } from '@/components/ui/conflict-notice';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { Caution } from '@/components/ui/cautions';
import type { ApplianceRecord } from '@/shared/schemas/api';
import { applianceFieldsSchema, type ApplianceFields } from '@/shared/schemas/appliance';
import type { z } from 'zod';
import { conflictCurrent } from '@/stores/queries/api-client';
import { useApplianceSaveMutation, type ApplianceSave } from '@/stores/queries/appliances';
import { keptForLater, queuedSaveKeys, useQueuedConflict, useSaveWaiting } from '@/stores/queries/offline-queue';
import { showToast } from '@/stores/toast-store';

/** The fields a refusal can name, in the order they appear. */
const APPLIANCE_FIELD_ORDER = [
  'name',
  'circuit',
  'quantity',
  'runningW',
  'standbyW',
  'dutyCycle',
  'heatInputW',
] as const;

type Props = {
  tripId: string;
  record: ApplianceRecord | null;
  initial: ApplianceFields;
  canEdit: boolean;
  onSaved: (r: ApplianceRecord) => void;
};

const fieldsOf = (r: ApplianceRecord): ApplianceFields => {
  const { id: _id, ...fields } = r.appliance;
  return fields;
};

const LABELS: Partial<Record<keyof ApplianceFields, [string, string]>> = {
  name: ['name', ''],
  circuit: ['circuit', ''],
  quantity: ['how many', ''],
  runningW: ['running', ' W'],
  standbyW: ['standby', ' W'],
  dutyCycle: ['duty cycle', ''],
  heatInputW: ['heat input', ' W'],
};

/** Their values for the fields where the two versions differ, e.g. "running 120 W". */
function describeDifferences(mine: Partial<Record<keyof ApplianceFields, unknown>>, theirs: ApplianceFields): string[] {
  return (Object.keys(LABELS) as (keyof ApplianceFields)[])
    .filter((k) => JSON.stringify(mine[k]) !== JSON.stringify(theirs[k]))
    .map((k) => {
      const [label, unit] = LABELS[k] ?? [k, ''];
      const value = k === 'dutyCycle' ? `${Math.round(theirs.dutyCycle * 100)} %` : `${String(theirs[k])}${unit}`;
      return `${label} ${value}`;
    });
}

/** An appliance's own figures (name, circuit, watts, duty cycle); its routine is edited beside it. */
export function ApplianceForm({ tripId, record, initial, canEdit, onSaved }: Props) {
  const save = useApplianceSaveMutation();
  const [formError, setFormError] = useState<string>();
  const isThisAppliance = (v: ApplianceSave) => !!record && v.applianceId === record.id;
  const queuedConflict = useQueuedConflict<ApplianceSave, ApplianceRecord>(queuedSaveKeys.appliance, isThisAppliance);
  const conflict = queuedConflict?.theirs ?? null;
  const waiting = useSaveWaiting<ApplianceSave>(queuedSaveKeys.appliance, isThisAppliance);
  const { control, handleSubmit, reset, formState, getValues, setError } = useForm<
    z.input<typeof applianceFieldsSchema>,
    unknown,
    ApplianceFields
  >({ resolver: zodResolver(applianceFieldsSchema), defaultValues: initial });
  const circuit = useWatch({ control, name: 'circuit' });
  // The version this form was opened on: a save names it, so a change made meanwhile by someone else gets a 409.
  const baseVersion = useRef(record?.version);
  const { isDirty } = formState;
  // A change refused after this form was closed (sent from the queue) comes back as it was typed.
  const refusedMine = queuedConflict?.mine.appliance;
  useEffect(() => {
    if (refusedMine && !isDirty) reset(refusedMine, { keepDefaultValues: true });
  }, [refusedMine, isDirty, reset]);
  useEffect(() => {
    // A newer record with nothing typed yet is simply shown; with typing in progress, the save decides.
    if (record && record.version !== baseVersion.current && !isDirty) {
      baseVersion.current = record.version;
      reset(fieldsOf(record));
    }
  }, [record, isDirty, reset]);

  const rebase = (saved: ApplianceRecord) => {
    baseVersion.current = saved.version;
    reset(fieldsOf(saved));
    onSaved(saved);
  };

  const send = (version: number | undefined) =>
    handleSubmit(async (values) => {
      setFormError(undefined);
      queuedConflict?.settle();
      const sent = save.mutateAsync({
        tripId,
        applianceId: record?.id ?? null,
        version,
        appliance: values,
        caretakerUserId: record?.caretakerUserId ?? null,
      });
      if (keptForLater(sent, rebase)) {
        showToast(`${values.name} kept on this device; it is sent when you are back online.`);
        return;
      }
      try {
        const saved = await sent;
        showToast(`${values.name} saved`);
        rebase(saved);
      } catch (error) {
        // A 409 is shown from the queue's record of it, with what was typed; other refusals land beside their
        // fields.
        if (!conflictCurrent(error))
          setFormError(
            showServerRefusal(error, {
              order: APPLIANCE_FIELD_ORDER,
              fieldOf: (apiField) => APPLIANCE_FIELD_ORDER.find((field) => `appliance.${field}` === apiField),
              setError,
              fallback: 'The appliance could not be saved.',
            }),
          );
      }
    });

  const num = (name: 'runningW' | 'standbyW' | 'quantity' | 'heatInputW', label: string, unit?: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref} style={styles.cell}>
          <NumberField
            testID={`appliance-${name}`}
            label={label}
            unit={unit}
            editable={canEdit}
            value={field.value}
            onChangeNumber={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );

  return (
    <View style={styles.form} testID="appliance-form">
      {formError ? <Banner testID="appliance-form-error" message={formError} /> : null}
      <FormTextField control={control} name="name" testID="appliance-name" label="Name" editable={canEdit} />
      <Controller
        control={control}
        name="circuit"
        render={({ field }) => (
          <ChoiceChips
            testID="appliance-circuit"
            label="Circuit"
            disabled={!canEdit}
            value={field.value}
            onChange={field.onChange}
            options={[
              { value: 'ac', label: 'AC' },
              { value: 'dc', label: 'DC' },
              { value: 'fuel', label: 'Fuel' },
            ]}
          />
        )}
      />
      <View style={styles.grid}>
        {num('runningW', circuit === 'fuel' ? 'Fan and controls' : 'Running', 'W')}
        {num('standbyW', 'Standby', 'W')}
        {num('quantity', 'How many')}
        <Controller
          control={control}
          name="dutyCycle"
          render={({ field, fieldState }) => (
            <View style={styles.cell}>
              <NumberField
                testID="appliance-duty"
                label="Duty cycle"
                unit="%"
                hint="share of its hours it really draws"
                editable={canEdit}
                value={field.value === undefined ? undefined : Math.round(field.value * 100)}
                onChangeNumber={(v) => field.onChange(v === null ? null : v / 100)}
                error={fieldState.error?.message}
              />
            </View>
          )}
        />
        {circuit === 'fuel' ? num('heatInputW', 'Propane heat input', 'W') : null}
      </View>
      {circuit === 'fuel' ? <Caution kind="propane" testID="caution-propane-appliance" /> : null}
      {conflict ? (
        <ConflictNotice
          testID="appliance-conflict"
          what="appliance"
          theirVersion={conflict.version}
          theirs={describeDifferences(getValues(), fieldsOf(conflict))}
          busy={save.isPending && !waiting}
          onKeepMine={() => void send(conflict.version)()}
          onTakeTheirs={() => {
            reset(fieldsOf(conflict));
            baseVersion.current = conflict.version;
            queuedConflict?.settle();
          }}
        />
      ) : null}
      {waiting ? (
        <Text color="lakeInk" role="status" testID="appliance-kept">
          Kept on this device: it is sent when you are back online.
        </Text>
      ) : null}
      {canEdit ? (
        <Button
          testID="appliance-save"
          label={record ? 'Save appliance' : 'Add appliance'}
          busy={formState.isSubmitting}
          disabled={formState.isSubmitting}
          onPress={() => void send(baseVersion.current)()}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  cell: { flexGrow: 1, flexBasis: 130 },
});
