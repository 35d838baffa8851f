import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef, useState } from 'react';
import { Controller, useFieldArray, useForm, useWatch } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { mass } from '@/components/format/units';
import { colors, space } from '@/components/theme/tokens';
import { FieldSlot } from '@/components/forms/field-slot';
import { FormTextField } from '@/components/forms/form-text-field';
import { showServerRefusal } from '@/components/forms/server-refusal';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { CautionArea, type CautionKind } from '@/components/ui/cautions';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { ConflictNotice } from '@/components/ui/conflict-notice';
import { NumberField } from '@/components/ui/number-field';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { RigRecord } from '@/shared/schemas/api';
import { rigSchema, type Rig, type RigInput } from '@/shared/schemas/rig';
import { fromDisplay, toDisplay } from '@/shared/units';
import { ApiError, conflictCurrent } from '@/stores/queries/api-client';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import type { DcLoad } from '@/shared/engine/dc-run-defaults';
import { CableCheckSection } from './cable-check-section';
import { GeneratorFields } from './generator-fields';
import { BATTERY_PRESETS, GENERATOR_PRESETS, INVERTER_PRESETS, SOLAR_PRESETS, TANK_PRESETS } from './part-presets';
import { Advanced, Num, Presets, Section } from './rig-fields';
import {
  bodyLength,
  INSULATION_CHOICES,
  INVERTER_HOURS_START,
  INVERTER_MODE_NOTE,
  newSolarArray,
  percentOfFraction,
  roofArea,
} from './rig-form-values';
import { rigFieldOf, rigFieldOrder } from './rig-refusal';
import { SolarArrayFields } from './solar-array-fields';

/** The trip's rig in grouped sections; saved as one record with its version. */
/** Saves the rig: a trip's own copy, or one of My rigs (both answer the saved record with its new version). */
export type RigSaver = {
  mutateAsync: (body: { version: number; rig: Rig }) => Promise<RigRecord>;
  isPending: boolean;
};

type RigFormProps = {
  save: RigSaver;
  record: RigRecord;
  canEdit: boolean;
  /** The trip's DC loads, from which the cable check suggests load circuits. */
  dcLoads?: readonly DcLoad[];
};

export function RigForm({ save, record, canEdit, dcLoads = [] }: RigFormProps) {
  const units = useUnits();
  const [formError, setFormError] = useState<string>();
  const [conflict, setConflict] = useState<RigRecord | null>(null);
  const { control, handleSubmit, setValue, setError, reset, formState } = useForm<RigInput, unknown, Rig>({
    resolver: zodResolver(rigSchema),
    defaultValues: record.rig,
  });
  const arrays = useFieldArray({ control, name: 'solarArrays' });
  const tanks = useFieldArray({ control, name: 'propaneTanks' });
  const [inverter, generator, controller, shoreCharger, vehicleCharger] = useWatch({
    control,
    name: ['inverter', 'generator', 'controller', 'shoreCharger', 'vehicleCharger'],
  });
  const off = !canEdit;
  // Saves name the version the form was opened on, so someone else's change meanwhile is caught (409).
  const baseVersion = useRef(record.version);
  const { isDirty } = formState;
  useEffect(() => {
    if (record.version !== baseVersion.current && !isDirty) {
      baseVersion.current = record.version;
      reset(record.rig);
    }
  }, [record, isDirty, reset]);
  const massUnit = mass(0, units).unit;

  const send = (version: number) =>
    handleSubmit(async (rig) => {
      setFormError(undefined);
      try {
        const saved = await save.mutateAsync({ version, rig });
        baseVersion.current = saved.version;
        reset(saved.rig);
        setConflict(null);
        showToast('Rig saved');
      } catch (error) {
        const current = conflictCurrent<RigRecord>(error);
        if (current) setConflict(current);
        else
          setFormError(
            showServerRefusal(error, {
              order: rigFieldOrder(error instanceof ApiError ? Object.keys(error.fields ?? {}) : []),
              fieldOf: rigFieldOf,
              setError,
              fallback: 'The rig could not be saved.',
            }),
          );
      }
    });

  const toggle = (label: string, on: boolean, testID: string, onChange: (on: boolean) => void) =>
    canEdit ? (
      <Button
        testID={testID}
        tone="quiet"
        label={on ? `Remove ${label}` : `Add ${label}`}
        onPress={() => onChange(!on)}
      />
    ) : null;

  return (
    <View style={styles.form} testID="rig-form">
      {Object.keys(formState.errors).length > 0 ? (
        <Banner testID="rig-form-invalid" message="Some figures need a look: see the messages below." />
      ) : null}
      <FormTextField control={control} name="name" testID="rig-name" label="Rig name" editable={canEdit} />
      <Section title="Battery bank" testID="rig-battery">
        <Presets
          testID="preset-battery"
          disabled={off}
          items={BATTERY_PRESETS}
          onPick={(i) => {
            const p = BATTERY_PRESETS[i]?.battery;
            if (p?.chemistry) setValue('battery.chemistry', p.chemistry, { shouldDirty: true });
            if (p?.capacityAh) setValue('battery.capacityAh', p.capacityAh, { shouldDirty: true });
            if (p?.nominalV) setValue('battery.nominalV', p.nominalV, { shouldDirty: true });
          }}
        />
        <Controller
          control={control}
          name="battery.chemistry"
          render={({ field }) => (
            <ChoiceChips
              testID="rig-chemistry"
              label="Chemistry"
              disabled={off}
              value={field.value}
              onChange={field.onChange}
              options={[
                { value: 'lifepo4', label: 'LiFePO4' },
                { value: 'agm', label: 'AGM' },
                { value: 'flooded', label: 'Flooded lead-acid' },
              ]}
            />
          )}
        />
        <View style={styles.grid}>
          <Num
            control={control}
            disabled={off}
            name="battery.capacityAh"
            label="Capacity"
            unit="Ah"
            range={[0, 10_000]}
            testID="rig-capacity"
          />
          <Num
            control={control}
            disabled={off}
            name="battery.nominalV"
            label="Voltage"
            unit="V"
            range={[6, 60]}
            testID="rig-voltage"
          />
        </View>
        <View style={styles.grid}>
          <Num
            control={control}
            disabled={off}
            optional
            name="battery.reservePct"
            label="Reserve"
            unit="%"
            range={[0, 100]}
            hint="left empty, the chemistry's usual depth of discharge"
            testID="rig-reserve"
          />
          <Num
            control={control}
            disabled={off}
            name="battery.initialSocPct"
            label="Charge at the start"
            unit="%"
            range={[0, 100]}
            hint="state of charge when the trip begins"
            testID="rig-initial-soc"
          />
        </View>
        <Controller
          control={control}
          name="battery.heatedSpace"
          render={({ field }) => (
            <ChoiceChips
              testID="rig-heated"
              label="Where the battery sits"
              disabled={off}
              value={field.value ? 'inside' : 'outside'}
              onChange={(v) => field.onChange(v === 'inside')}
              options={[
                { value: 'outside', label: 'Outside the heated space' },
                { value: 'inside', label: 'Inside the heated space' },
              ]}
            />
          )}
        />
        <Text variant="caption" color="inkSoft">
          Inside, the battery is at the living space's temperature (kept up by the heating), so a cold night outside
          neither shrinks what it holds nor stops it charging. Outside, it follows the air.
        </Text>
      </Section>

      <Section title="Living space" testID="rig-cabin">
        <Text variant="caption" color="inkSoft">
          Heating and cooling come from the living space's heat balance: how much heat its walls let through, the sun on
          its roof and windows, and the people and appliances inside.
        </Text>
        <View style={styles.grid}>
          <Num
            control={control}
            disabled={off}
            name="cabin.lengthM"
            label="Body length"
            shown={bodyLength(units)}
            range={[2, 20]}
            hint="outside, without the drawbar"
            testID="rig-cabin-length"
          />
          <Num
            control={control}
            disabled={off}
            name="cabin.occupants"
            label="People aboard"
            range={[0, 12]}
            hint="about 100 W of heat each"
            testID="rig-cabin-occupants"
          />
        </View>
        <Controller
          control={control}
          name="cabin.insulation"
          render={({ field }) => (
            <ChoiceChips
              testID="rig-cabin-insulation"
              label="Insulation"
              disabled={off}
              value={field.value ?? 'standard'}
              onChange={field.onChange}
              options={[...INSULATION_CHOICES]}
            />
          )}
        />
        <Advanced
          what="body size"
          testID="rig-cabin-advanced"
          control={control}
          fields={['cabin.widthM', 'cabin.heightM']}
        >
          <View style={styles.grid}>
            <Num
              control={control}
              disabled={off}
              name="cabin.widthM"
              label="Body width"
              shown={bodyLength(units)}
              range={[1.2, 3]}
              testID="rig-cabin-width"
            />
            <Num
              control={control}
              disabled={off}
              name="cabin.heightM"
              label="Body height"
              shown={bodyLength(units)}
              range={[1.2, 3.5]}
              hint="floor to roof, outside"
              testID="rig-cabin-height"
            />
          </View>
        </Advanced>
      </Section>

      <Section title="Solar" testID="rig-solar">
        <Num
          control={control}
          disabled={off}
          optional
          name="cabin.roofAreaM2"
          label="Roof area"
          shown={roofArea(units)}
          range={[1, 60]}
          hint="the whole roof, outside; left empty, the body's length × width. More-solar fixes count about 60 % of it as room for panels, less the panels already up there"

          testID="rig-roof-area"
        />
        {arrays.fields.map((f, i) => (
          <SolarArrayFields
            key={f.id}
            control={control}
            setValue={setValue}
            index={i}
            units={units}
            disabled={off}
            onRemove={canEdit ? () => arrays.remove(i) : null}
          />
        ))}
        <Presets
          testID="preset-solar"
          disabled={off}
          items={SOLAR_PRESETS.map((w) => ({ label: `+ ${w} W flat` }))}
          onPick={(i) => {
            arrays.append(newSolarArray(SOLAR_PRESETS[i] ?? 200, arrays.fields.length));
            if (!controller)
              setValue('controller', { kind: 'mppt', maxAmps: 30, efficiency: 0.97 }, { shouldDirty: true });
          }}
        />
        {controller ? (
          <>
            <Controller
              control={control}
              name="controller.kind"
              render={({ field }) => (
                <ChoiceChips
                  testID="rig-controller-kind"
                  label="Charge controller"
                  disabled={off}
                  value={field.value ?? 'mppt'}
                  onChange={field.onChange}
                  options={[
                    { value: 'mppt', label: 'MPPT' },
                    { value: 'pwm', label: 'PWM' },
                  ]}
                />
              )}
            />
            <View style={styles.grid}>
              <Num
                control={control}
                disabled={off}
                name="controller.maxAmps"
                label="Controller rating"
                unit="A"
                range={[0, 500]}
                testID="rig-controller-amps"
              />
              <Num
                control={control}
                disabled={off}
                name="controller.efficiency"
                label="Controller efficiency"
                shown={percentOfFraction}
                range={[0.5, 1]}
                hint="about 97 % for MPPT"
                testID="rig-controller-efficiency"
              />
            </View>
          </>
        ) : null}
        {formState.errors.controller?.message ? (
          <Text color="ember" variant="caption">
            {formState.errors.controller.message}
          </Text>
        ) : null}
      </Section>

      <Section
        title="Inverter"
        testID="rig-inverter"
        right={toggle('inverter', !!inverter, 'rig-inverter-toggle', (on) =>
          setValue('inverter', on ? (INVERTER_PRESETS[1]?.inverter ?? null) : null, { shouldDirty: true }),
        )}
      >
        {inverter ? (
          <>
            <Presets
              testID="preset-inverter"
              disabled={off}
              items={INVERTER_PRESETS}
              onPick={(i) => setValue('inverter', INVERTER_PRESETS[i]?.inverter ?? null, { shouldDirty: true })}
            />
            <View style={styles.grid}>
              <Num
                control={control}
                disabled={off}
                name="inverter.ratedW"
                label="Rating"
                unit="W"
                range={[0, 20_000]}
                testID="rig-inverter-watts"
              />
              <Num
                control={control}
                disabled={off}
                optional
                name="inverter.surgeW"
                label="Surge (optional)"
                unit="W"
                range={[0, 60_000]}
                hint="for a few seconds, when motors start"
                testID="rig-inverter-surge"
              />
            </View>
            <Controller
              control={control}
              name="inverter.mode"
              render={({ field }) => (
                <ChoiceChips
                  testID="rig-inverter-mode"
                  label="Switched on"
                  disabled={off}
                  value={field.value ?? 'on-demand'}
                  onChange={(mode) => {
                    field.onChange(mode);
                    if (mode === 'scheduled' && !inverter.onHours)
                      setValue('inverter.onHours', { ...INVERTER_HOURS_START }, { shouldDirty: true });
                  }}
                  options={[
                    { value: 'on-demand', label: 'Only when AC is used' },
                    { value: 'scheduled', label: 'In set hours' },
                    { value: 'always', label: 'All the time' },
                  ]}
                />
              )}
            />
            {inverter.mode === 'scheduled' ? (
              <View style={styles.grid}>
                <Num
                  control={control}
                  disabled={off}
                  name="inverter.onHours.startHour"
                  label="On from"
                  unit="h"
                  range={[0, 24]}
                  hint="local hour, 0–24"
                  testID="rig-inverter-on-from"
                />
                <Num
                  control={control}
                  disabled={off}
                  name="inverter.onHours.endHour"
                  label="Off at"
                  unit="h"
                  range={[0, 24]}
                  hint="an earlier hour runs past midnight"
                  testID="rig-inverter-off-at"
                />
              </View>
            ) : null}
            <Text variant="caption" color="inkSoft">
              {INVERTER_MODE_NOTE[inverter.mode ?? 'on-demand']}
            </Text>
            <Advanced
              what="inverter losses"
              testID="rig-inverter-advanced"
              control={control}
              fields={['inverter.efficiency', 'inverter.idleW']}
            >
              <View style={styles.grid}>
                <Num
                  control={control}
                  disabled={off}
                  name="inverter.efficiency"
                  label="Efficiency"
                  shown={percentOfFraction}
                  range={[0.5, 1]}
                  hint="at its best load; light loads get less"
                  testID="rig-inverter-efficiency"
                />
                <Num
                  control={control}
                  disabled={off}
                  name="inverter.idleW"
                  label="Idle draw"
                  unit="W"
                  range={[0, 200]}
                  hint="drawn whenever it is switched on"
                  testID="rig-inverter-idle"
                />
              </View>
            </Advanced>
          </>
        ) : (
          <Text color="inkSoft">No inverter: AC appliances run only on a hookup or generator.</Text>
        )}
      </Section>

      <Section title="Chargers" testID="rig-chargers">
        {shoreCharger ? (
          <View style={styles.grid}>
            <Num
              control={control}
              disabled={off}
              name="shoreCharger.amps"
              label="Shore charger"
              unit="A"
              range={[0, 500]}
              testID="rig-shore-amps"
            />
            <Num
              control={control}
              disabled={off}
              name="shoreCharger.efficiency"
              label="Shore charger efficiency"
              shown={percentOfFraction}
              range={[0.5, 1]}
              hint="share of hookup power that reaches the battery"
              testID="rig-shore-efficiency"
            />
          </View>
        ) : null}
        {vehicleCharger ? (
          <>
            <Controller
              control={control}
              name="vehicleCharger.kind"
              render={({ field }) => (
                <ChoiceChips
                  testID="rig-vehicle-kind"
                  label="Vehicle charging"
                  disabled={off}
                  value={field.value ?? 'dc-dc'}
                  onChange={field.onChange}
                  options={[
                    { value: 'dc-dc', label: 'DC-DC charger' },
                    { value: 'alternator', label: 'Straight from the alternator' },
                  ]}
                />
              )}
            />
            <View style={styles.grid}>
              <Num
                control={control}
                disabled={off}
                name="vehicleCharger.amps"
                label="Vehicle charger"
                unit="A"
                range={[0, 300]}
                hint="while driving"
                testID="rig-vehicle-amps"
              />
            </View>
          </>
        ) : null}
        <View style={styles.presets}>
          {toggle('shore charger', !!shoreCharger, 'rig-shore-toggle', (on) =>
            setValue('shoreCharger', on ? { amps: 20, efficiency: 0.9 } : null, { shouldDirty: true }),
          )}
          {toggle('vehicle charger', !!vehicleCharger, 'rig-vehicle-toggle', (on) =>
            setValue('vehicleCharger', on ? { kind: 'dc-dc', amps: 25 } : null, { shouldDirty: true }),
          )}
        </View>
      </Section>

      <Section
        title="Generator"
        testID="rig-generator"
        right={toggle('generator', !!generator, 'rig-generator-toggle', (on) =>
          setValue('generator', on ? (GENERATOR_PRESETS[0]?.generator ?? null) : null, { shouldDirty: true }),
        )}
      >
        {generator ? (
          <>
            <Presets
              testID="preset-generator"
              disabled={off}
              items={GENERATOR_PRESETS}
              onPick={(i) => setValue('generator', GENERATOR_PRESETS[i]?.generator ?? null, { shouldDirty: true })}
            />
            {/* Keyed on the record so a reset (save, conflict) forgets set hours the new record does not have. */}
            <GeneratorFields key={record.version} control={control} setValue={setValue} disabled={off} />
          </>
        ) : (
          <Text color="inkSoft">No generator.</Text>
        )}
      </Section>

      <Section title="Propane" testID="rig-propane">
        {tanks.fields.map((f, i) => (
          <View key={f.id} style={[styles.grid, styles.item]} testID={`rig-tank-${i}-card`}>
            <Controller
              control={control}
              name={`propaneTanks.${i}.name`}
              render={({ field, fieldState }) => (
                <FieldSlot fieldRef={field.ref} style={styles.cell}>
                  <TextField
                    testID={`rig-tank-${i}-name`}
                    label={`Cylinder ${i + 1} name`}
                    editable={canEdit}
                    value={field.value ?? ''}
                    onChangeText={field.onChange}
                    onBlur={field.onBlur}
                    error={
                      fieldState.error?.type === 'server'
                        ? fieldState.error.message
                        : fieldState.error
                          ? 'Give the cylinder a name (up to 80 letters).'
                          : undefined
                    }
                  />
                </FieldSlot>
              )}
            />
            <Controller
              control={control}
              name={`propaneTanks.${i}.propaneKg`}
              render={({ field, fieldState }) => (
                <View style={styles.cell}>
                  <NumberField
                    testID={`rig-tank-${i}`}
                    label="Holds"
                    unit={massUnit}
                    editable={canEdit}
                    value={
                      field.value === undefined
                        ? undefined
                        : Math.round(toDisplay(field.value, 'mass', units).value * 10) / 10
                    }
                    onChangeNumber={(v) => field.onChange(v === null ? null : fromDisplay(v, 'mass', units))}
                    error={fieldState.error ? `Enter how much propane it holds, in ${massUnit}.` : undefined}
                  />
                </View>
              )}
            />
            <Num
              control={control}
              disabled={off}
              name={`propaneTanks.${i}.fillPct`}
              label="Full at the start"
              unit="%"
              range={[0, 100]}
              testID={`rig-tank-${i}-fill`}
            />
            {canEdit ? (
              <Button
                testID={`rig-tank-${i}-remove`}
                tone="quiet"
                style={styles.remove}
                label={`Remove cylinder ${i + 1}`}
                onPress={() => tanks.remove(i)}
              />
            ) : null}
          </View>
        ))}
        <Presets
          testID="preset-tank"
          disabled={off}
          items={TANK_PRESETS.map((t) => ({ label: `+ ${t.label}` }))}
          onPick={(i) => tanks.append({ name: 'Cylinder', propaneKg: TANK_PRESETS[i]?.propaneKg ?? 6, fillPct: 100 })}
        />
      </Section>
      <CableCheckSection control={control} setValue={setValue} units={units} disabled={off} dcLoads={dcLoads} />
      {/* One safety area for the whole rig, holding only the cautions that apply to it (the cabling caution sits in
          the cable check, beside the runs it is about). */}
      <CautionArea
        testID="rig-cautions"
        kinds={[
          'lithiumCold',
          ...(generator ? (['generator'] as CautionKind[]) : []),
          ...(tanks.fields.length > 0 ? (['propane'] as CautionKind[]) : []),
        ]}
      />
      {conflict ? (
        <ConflictNotice
          testID="rig-conflict"
          what="rig"
          theirVersion={conflict.version}
          busy={save.isPending}
          onKeepMine={() => void send(conflict.version)()}
          onTakeTheirs={() => {
            reset(conflict.rig);
            baseVersion.current = conflict.version;
            setConflict(null);
          }}
        />
      ) : null}
      {/* What no field shows stands beside Save, where the eye is after pressing it. */}
      {formError ? <Banner testID="rig-form-error" message={formError} /> : null}
      {canEdit ? (
        <Button
          testID="rig-save"
          label="Save rig"
          busy={formState.isSubmitting}
          disabled={formState.isSubmitting}
          onPress={() => void send(baseVersion.current)()}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.xl },
  head: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: space.sm,
  },
  grid: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
  // Basis 0 with a minimum width: equal columns that wrap to one per row on a phone.
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  // Level with the inputs beside it, which sit below their labels.
  remove: { marginTop: space.xl },
  // A rule under each cylinder, so on a phone one cylinder's fields do not run into the next one's.
  item: { paddingBottom: space.md, borderBottomWidth: 1, borderBottomColor: colors.line },
  presets: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.xs },
});
