import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { Controller, useForm, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { FieldSlot } from '@/components/forms/field-slot';
import { ZoneField } from '@/components/forms/zone-field';
import { showServerRefusal } from '@/components/forms/server-refusal';
import { temperature } from '@/components/format/units';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Caution } from '@/components/ui/cautions';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { ConflictNotice } from '@/components/ui/conflict-notice';
import { DateTimeField } from '@/components/ui/date-time-field';
import { NumberField } from '@/components/ui/number-field';
import { TextField } from '@/components/ui/text-field';
import type { StopRecord } from '@/shared/schemas/api';
import { conflictCurrent } from '@/stores/queries/api-client';
import { useStopSaveMutation } from '@/stores/queries/route';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { SITE_PRESETS } from '@/shared/engine/site-exposure';
import type { SitePreset } from '@/shared/schemas/trip';
import {
  fromFormValues,
  presetAt,
  STOP_FIELD_ORDER,
  stopFieldOf,
  stopFormSchema,
  toFormValues,
  type StopFormValues,
} from './stop-form-values';
import { NearestTowns } from './nearest-towns';
import { PlaceSearchField } from './place-search-field';
import { StopSkyFields, StopTemperatureSource } from './stop-sky-fields';

type Props = {
  tripId: string;
  record: StopRecord | null;
  fallbackZone: string;
  onDone: () => void;
  /** A new stop's suggested arrival and departure (local "YYYY-MM-DD HH:MM"), after the last stop. */
  newStopTimes?: { arrive: string; depart: string };
};
type NumName =
  | 'lat'
  | 'lon'
  | 'amps'
  | 'volts'
  | 'generatorStart'
  | 'generatorEnd'
  | 'low'
  | 'high'
  | 'canopyPct'
  | 'opennessPct'
  | 'leafAreaIndex';

function Num({
  control,
  name,
  label,
  unit,
  hint,
  testID,
}: {
  control: Control<StopFormValues>;
  name: NumName;
  label: string;
  unit?: string;
  hint?: string;
  testID: string;
}) {
  // Numbers always sit in a row of two.
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref} style={styles.cell}>
          <NumberField
            testID={testID}
            label={label}
            unit={unit}
            hint={hint}
            value={field.value}
            onChangeNumber={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );
}

function Txt({
  control,
  name,
  label,
  hint,
  testID,
  inRow = false,
}: {
  control: Control<StopFormValues>;
  name: 'horizon' | 'notes';
  label: string;
  hint?: string;
  testID: string;
  inRow?: boolean;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref} style={inRow ? styles.cell : null}>
          <TextField
            testID={testID}
            label={label}
            hint={hint}
            value={field.value}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );
}

/** A local day and time at the stop, through the platform's own picker. */
function When({
  control,
  name,
  label,
  testID,
}: {
  control: Control<StopFormValues>;
  name: 'arrive' | 'depart';
  label: string;
  testID: string;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <FieldSlot fieldRef={field.ref} style={styles.cell}>
          <DateTimeField
            kind="datetime"
            testID={testID}
            label={label}
            value={field.value}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error?.message}
          />
        </FieldSlot>
      )}
    />
  );
}

/** Add or edit a stop. The form keeps everything typed when the server refuses it. */
export function StopForm({ tripId, record, fallbackZone, onDone, newStopTimes }: Props) {
  const units = useUnits();
  const save = useStopSaveMutation(tripId);
  const [formError, setFormError] = useState<string>();
  const [conflict, setConflict] = useState<StopRecord | null>(null);
  const { control, handleSubmit, setError, setValue, getValues, reset, formState } = useForm<StopFormValues>({
    resolver: zodResolver(stopFormSchema),
    defaultValues: {
      ...toFormValues(record?.stop ?? null, record?.notes ?? '', units, fallbackZone),
      ...(record ? {} : newStopTimes),
    },
  });
  const [exposureKind, hookupOn, generatorOn, opennessPct, leafAreaIndex, lat, lon] = useWatch({
    control,
    name: ['exposureKind', 'hookupOn', 'generatorOn', 'opennessPct', 'leafAreaIndex', 'lat', 'lon'],
  });
  const tUnit = temperature(0, units).unit;
  // Saves name the version the form was opened on, so someone else's change meanwhile is caught (409).
  const baseVersion = useRef(record?.version);
  const { isDirty } = formState;
  useEffect(() => {
    if (record && record.version !== baseVersion.current && !isDirty) {
      baseVersion.current = record.version;
      reset(toFormValues(record.stop, record.notes, units, fallbackZone));
    }
  }, [record, isDirty, reset, units, fallbackZone]);

  const zoneFromCoordinates = async () => {
    const { lat, lon } = getValues();
    // Loaded on demand: the zone table is only needed here.
    const { default: tzlookup } = await import('tz-lookup');
    try {
      setValue('timeZone', tzlookup(lat, lon), { shouldValidate: true });
    } catch {
      setError('timeZone', { message: 'No time zone found for those coordinates; choose one from the list.' });
    }
  };

  const send = (version: number | undefined) =>
    handleSubmit(async (values) => {
      setFormError(undefined);
      const built = fromFormValues(values, units);
      if (!built.ok) {
        const fields = STOP_FIELD_ORDER.filter((field) => built.errors[field]);
        fields.forEach((field, i) => setError(field, { message: built.errors[field] }, { shouldFocus: i === 0 }));
        return;
      }
      try {
        await save.mutateAsync({ stopId: record?.id ?? null, version, stop: built.stop, notes: values.notes });
        showToast(`${values.name} saved`);
        setConflict(null);
        onDone();
      } catch (error) {
        const current = conflictCurrent<StopRecord>(error);
        if (current) setConflict(current);
        else
          setFormError(
            showServerRefusal(error, {
              order: STOP_FIELD_ORDER,
              fieldOf: stopFieldOf,
              setError,
              fallback: 'The stop could not be saved.',
            }),
          );
      }
    });

  return (
    <View style={styles.form} testID="stop-form">
      <Controller
        control={control}
        name="name"
        render={({ field, fieldState }) => (
          <FieldSlot fieldRef={field.ref}>
            <PlaceSearchField
              testID="stop-name"
              value={field.value}
              onChangeText={field.onChange}
              onBlur={field.onBlur}
              error={fieldState.error?.message}
              onPick={(place) => {
                const set = { shouldValidate: true, shouldDirty: true };
                setValue('name', place.name, set);
                setValue('lat', place.lat, set);
                setValue('lon', place.lon, set);
                if (place.timeZone) setValue('timeZone', place.timeZone, set);
              }}
            />
          </FieldSlot>
        )}
      />
      <View style={styles.grid}>
        <Num control={control} name="lat" label="Latitude" unit="°" testID="stop-lat" />
        <Num control={control} name="lon" label="Longitude" unit="°" testID="stop-lon" />
      </View>
      <NearestTowns lat={lat} lon={lon} testID="stop-nearest-towns" />
      <Controller
        control={control}
        name="timeZone"
        render={({ field, fieldState }) => (
          <FieldSlot fieldRef={field.ref}>
            <ZoneField
              testID="stop-time-zone"
              label="Time zone"
              value={field.value}
              onChange={(zone) => setValue('timeZone', zone, { shouldValidate: true, shouldDirty: true })}
              error={fieldState.error?.message}
              extraAction={
                <Button
                  testID="stop-zone-from-coordinates"
                  tone="secondary"
                  label="From coordinates"
                  accessibilityLabel="Set the time zone from the coordinates"
                  onPress={() => void zoneFromCoordinates()}
                />
              }
            />
          </FieldSlot>
        )}
      />
      <View style={styles.grid}>
        <When control={control} name="arrive" label="Arrive (local time)" testID="stop-arrive" />
        <When control={control} name="depart" label="Leave (local time)" testID="stop-depart" />
      </View>
      <Controller
        control={control}
        name="exposureKind"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-exposure-kind"
            label="Site exposure"
            value={field.value}
            onChange={field.onChange}
            options={[
              { value: 'canopy', label: 'Sky openness' },
              { value: 'custom', label: 'Custom horizon' },
            ]}
          />
        )}
      />
      {exposureKind === 'canopy' ? (
        <>
          <ChoiceChips<SitePreset | ''>
            testID="stop-preset"
            label="Quick picks"
            value={presetAt(opennessPct, leafAreaIndex) ?? ''}
            onChange={(preset) => {
              if (!preset) return;
              setValue('opennessPct', SITE_PRESETS[preset].skyOpennessPct, { shouldDirty: true, shouldValidate: true });
              setValue('leafAreaIndex', SITE_PRESETS[preset].leafAreaIndex, {
                shouldDirty: true,
                shouldValidate: true,
              });
            }}
            options={[
              { value: 'open', label: 'Open sky' },
              { value: 'light-cover', label: 'Light tree cover' },
              { value: 'partial-shade', label: 'Partial shade' },
              { value: 'deep-forest', label: 'Deep forest' },
            ]}
          />
          <View style={styles.grid}>
            <Num
              control={control}
              name="opennessPct"
              label="Sky openness"
              unit="%"
              hint="share of the sky the pitch sees; a canopy photo or app measures it"
              testID="stop-openness"
            />
            <Num
              control={control}
              name="leafAreaIndex"
              label="Leaf-area index"
              hint="how thick the canopy is: 1 sparse, 3 woodland, 5 dense forest"
              testID="stop-leaf-area"
            />
          </View>
          <Controller
            control={control}
            name="deciduous"
            render={({ field }) => (
              <ChoiceChips
                testID="stop-deciduous"
                label="Trees"
                value={field.value ? 'deciduous' : 'evergreen'}
                onChange={(v) => field.onChange(v === 'deciduous')}
                options={[
                  { value: 'evergreen', label: 'Evergreen' },
                  { value: 'deciduous', label: 'Lose their leaves in winter' },
                ]}
              />
            )}
          />
        </>
      ) : (
        <View style={styles.grid}>
          <Txt
            control={control}
            name="horizon"
            inRow
            label="Horizon angles (°)"
            hint="clockwise from north, e.g. 5, 10, 25, 30, 20, 10, 25, 35"
            testID="stop-horizon"
          />
          <Num control={control} name="canopyPct" label="Light through the cover" unit="%" testID="stop-canopy" />
        </View>
      )}
      <StopSkyFields control={control} />
      <Controller
        control={control}
        name="hookupOn"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-hookup"
            label="Hookup"
            value={field.value ? 'yes' : 'no'}
            onChange={(v) => field.onChange(v === 'yes')}
            options={[
              { value: 'no', label: 'None' },
              { value: 'yes', label: 'Shore power' },
            ]}
          />
        )}
      />
      {hookupOn ? (
        <View style={styles.grid}>
          <Num control={control} name="amps" label="Amps" unit="A" testID="stop-amps" />
          <Num control={control} name="volts" label="Volts" unit="V" testID="stop-volts" />
        </View>
      ) : null}
      <Controller
        control={control}
        name="generatorOn"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-generator"
            label="Generator allowed"
            value={field.value ? 'yes' : 'no'}
            onChange={(v) => field.onChange(v === 'yes')}
            options={[
              { value: 'no', label: 'No' },
              { value: 'yes', label: 'Yes, between' },
            ]}
          />
        )}
      />
      {generatorOn ? (
        <>
          <View style={styles.grid}>
            <Num control={control} name="generatorStart" label="From hour" testID="stop-generator-start" />
            <Num control={control} name="generatorEnd" label="Until hour" testID="stop-generator-end" />
          </View>
          <Caution kind="generator" testID="caution-generator-stop" />
        </>
      ) : null}
      <StopTemperatureSource control={control} />
      <View style={styles.grid}>
        <Num control={control} name="low" label="Expected low" unit={tUnit} testID="stop-low" />
        <Num control={control} name="high" label="Expected high" unit={tUnit} testID="stop-high" />
      </View>
      <Txt control={control} name="notes" label="Notes" testID="stop-notes" />
      {conflict ? (
        <ConflictNotice
          testID="stop-conflict"
          what="stop"
          theirVersion={conflict.version}
          busy={save.isPending}
          onKeepMine={() => void send(conflict.version)()}
          onTakeTheirs={() => {
            reset(toFormValues(conflict.stop, conflict.notes, units, fallbackZone));
            baseVersion.current = conflict.version;
            setConflict(null);
          }}
        />
      ) : null}
      {/* Beside Save, where the eye is after pressing it; refusals about one field sit beside that field. */}
      {formError ? <Banner testID="stop-form-error" message={formError} /> : null}
      <View style={styles.actions}>
        <Button
          testID="stop-save"
          label={record ? 'Save stop' : 'Add stop'}
          busy={formState.isSubmitting}
          disabled={formState.isSubmitting}
          onPress={() => void send(baseVersion.current)()}
        />
        <Button testID="stop-cancel" label="Cancel" tone="quiet" onPress={onDone} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  // Basis 0 with a minimum width: equal columns in a row that wrap on a phone, and no fixed height in a column.
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  zone: { gap: space.sm },
  // Under the zone's field rather than beside it: two buttons beside it left the zone name too narrow to read.
  zoneButtons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
