// The fields of one DC run in the rig form: what it connects, its length, conductor, insulation, copper, place,
// drop limit and protection, and for load circuits the watts they carry.
import { Controller, useWatch, type FieldPathByValue, type UseFormSetValue } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { inFamily, stepSize } from '@/shared/engine/conductor-size';
import {
  DC_RUN_KINDS,
  DC_RUN_LENGTH_M,
  INSULATION_RATINGS_C,
  MAX_LOAD_W,
  MAX_SURGE_W,
  type ConductorSize,
  type DcRunKind,
} from '@/shared/schemas/dc-wiring';
import type { RigInput } from '@/shared/schemas/rig';
import type { UnitSystem } from '@/shared/units';
import { equivalentText, KIND_SHORT, runLength, sizeText } from './dc-run-values';
import { fieldStyles, Num, type RigControl } from './rig-fields';

type Props = {
  control: RigControl;
  setValue: UseFormSetValue<RigInput>;
  index: number;
  units: UnitSystem;
  disabled: boolean;
};

// The form's type allows a missing size while the rig is typed in; a stored run always has one.
const FALLBACK_SIZE: ConductorSize = { unit: 'mm2', mm2: 2.5 };
const KIND_OPTIONS = DC_RUN_KINDS.map((k) => ({ value: k, label: KIND_SHORT[k] }));
const TAKES_LOAD = new Set<DcRunKind>(['dc-load', 'battery-distribution']);

/** Thinner and thicker buttons around the size, with the other family's equivalent beneath. */
function SizeStepper({
  value,
  onChange,
  disabled,
  testID,
}: {
  value: ConductorSize;
  onChange: (size: ConductorSize) => void;
  disabled: boolean;
  testID: string;
}) {
  const thinner = stepSize(value, -1);
  const thicker = stepSize(value, 1);
  return (
    <View style={styles.sizeWrap}>
      <Text variant="label">Conductor size</Text>
      <View style={styles.stepper}>
        <Button
          testID={`${testID}-thinner`}
          tone="secondary"
          label="−"
          accessibilityLabel="Thinner conductor"
          disabled={disabled || !thinner}
          onPress={() => thinner && onChange(thinner)}
          style={styles.stepButton}
        />
        <View style={styles.sizeShown} testID={`${testID}-value`} accessible accessibilityLabel={sizeText(value)}>
          <Text variant="figure">{value.unit === 'awg' ? value.awg : value.mm2}</Text>
          <Text variant="unit">{value.unit === 'awg' ? 'AWG' : 'mm²'}</Text>
        </View>
        <Button
          testID={`${testID}-thicker`}
          tone="secondary"
          label="+"
          accessibilityLabel="Thicker conductor"
          disabled={disabled || !thicker}
          onPress={() => thicker && onChange(thicker)}
          style={styles.stepButton}
        />
      </View>
      <Text variant="caption" color="inkSoft">
        {equivalentText(value)}
      </Text>
      <ChoiceChips
        testID={`${testID}-family`}
        label="Sized in"
        disabled={disabled}
        value={value.unit}
        onChange={(unit) => onChange(inFamily(value, unit))}
        options={[
          { value: 'mm2', label: 'mm²' },
          { value: 'awg', label: 'AWG' },
        ]}
      />
    </View>
  );
}

type Choice = { value: string; label: string };

/** A yes/no field of the run shown as two named chips; `unset` is what the form shows before a value is set. */
function TwoWayChips({
  control,
  name,
  label,
  testID,
  disabled,
  yes,
  no,
  unset,
  yesFirst = false,
}: {
  control: RigControl;
  name: FieldPathByValue<RigInput, boolean | undefined>;
  label: string;
  testID: string;
  disabled: boolean;
  yes: Choice;
  no: Choice;
  unset: boolean;
  yesFirst?: boolean;
}) {
  return (
    <Controller
      control={control}
      name={name}
      render={({ field }) => (
        <ChoiceChips
          testID={testID}
          label={label}
          disabled={disabled}
          value={(typeof field.value === 'boolean' ? field.value : unset) ? yes.value : no.value}
          onChange={(v) => field.onChange(v === yes.value)}
          options={yesFirst ? [yes, no] : [no, yes]}
        />
      )}
    />
  );
}

export function DcRunEditor({ control, setValue, index, units, disabled }: Props) {
  const base = `dcWiring.runs.${index}` as const;
  const id = `dc-run-${index}`;
  const [kind, protection] = useWatch({ control, name: [`${base}.kind`, `${base}.protection`] });
  const protectionKind = protection?.kind ?? 'none';
  const protectionAmps = protection && 'amps' in protection ? protection.amps : undefined;
  return (
    <View style={styles.editor} testID={`${id}-editor`}>
      <Controller
        control={control}
        name={`${base}.name`}
        render={({ field, fieldState }) => (
          <TextField
            testID={`${id}-name`}
            label="Name"
            editable={!disabled}
            value={field.value ?? ''}
            onChangeText={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error ? 'Give the run a name (up to 80 letters).' : undefined}
          />
        )}
      />
      <Controller
        control={control}
        name={`${base}.kind`}
        render={({ field }) => (
          <ChoiceChips
            testID={`${id}-kind`}
            label="Connects"
            disabled={disabled}
            value={field.value ?? 'dc-load'}
            onChange={(k: DcRunKind) => {
              field.onChange(k);
              // Only load circuits and the distribution point carry watts of their own.
              if (!TAKES_LOAD.has(k)) {
                setValue(`${base}.loadW`, undefined, { shouldDirty: true });
                setValue(`${base}.surgeW`, undefined, { shouldDirty: true });
              }
            }}
            options={KIND_OPTIONS}
          />
        )}
      />
      <View style={fieldStyles.grid}>
        <Num
          control={control}
          disabled={disabled}
          name={`${base}.lengthM`}
          label="Length, one way"
          shown={runLength(units)}
          range={[DC_RUN_LENGTH_M.min, DC_RUN_LENGTH_M.max]}
          hint="the cable's route, not the straight line"
          testID={`${id}-length`}
        />
        {kind && TAKES_LOAD.has(kind) ? (
          <>
            <Num
              control={control}
              disabled={disabled}
              optional
              name={`${base}.loadW`}
              label={kind === 'dc-load' ? 'Running' : 'Feeds (optional)'}
              unit="W"
              range={[0, MAX_LOAD_W]}
              message={kind === 'dc-load' ? 'Enter the watts this circuit carries.' : undefined}
              hint={kind === 'dc-load' ? undefined : 'left empty, the load circuits below it together'}
              testID={`${id}-load`}
            />
            <Num
              control={control}
              disabled={disabled}
              optional
              name={`${base}.surgeW`}
              label="Start-up (optional)"
              unit="W"
              range={[0, MAX_SURGE_W]}
              hint="a motor's moment of starting"
              testID={`${id}-surge`}
            />
          </>
        ) : null}
      </View>
      <Controller
        control={control}
        name={`${base}.size`}
        render={({ field }) => (
          <SizeStepper
            value={field.value ?? FALLBACK_SIZE}
            onChange={field.onChange}
            disabled={disabled}
            testID={`${id}-size`}
          />
        )}
      />
      <Controller
        control={control}
        name={`${base}.insulationC`}
        render={({ field }) => (
          <ChoiceChips
            testID={`${id}-insulation`}
            label="Insulation rated for"
            disabled={disabled}
            value={String(field.value ?? 105)}
            onChange={(v) => field.onChange(Number(v))}
            options={INSULATION_RATINGS_C.map((c) => ({ value: String(c), label: `${c} °C` }))}
          />
        )}
      />
      <TwoWayChips
        control={control}
        name={`${base}.tinned`}
        testID={`${id}-copper`}
        label="Copper"
        disabled={disabled}
        no={{ value: 'bare', label: 'Bare' }}
        yes={{ value: 'tinned', label: 'Tinned' }}
        unset={false}
      />
      <TwoWayChips
        control={control}
        name={`${base}.engineSpace`}
        testID={`${id}-place`}
        label="Runs through"
        disabled={disabled}
        no={{ value: 'outside', label: 'Living or storage space' }}
        yes={{ value: 'engine', label: 'An engine space' }}
        unset={false}
      />
      <TwoWayChips
        control={control}
        name={`${base}.critical`}
        testID={`${id}-critical`}
        label="Voltage drop allowed"
        disabled={disabled}
        yes={{ value: 'critical', label: '3 %, critical' }}
        no={{ value: 'other', label: '10 %, other' }}
        unset
        yesFirst
      />
      <Text variant="caption" color="inkSoft">
        Critical: charging, the inverter, pumps and electronics. Other: lights and small loads.
      </Text>
      <ChoiceChips
        testID={`${id}-protection`}
        label="Protection"
        disabled={disabled}
        value={protectionKind}
        onChange={(k) =>
          setValue(`${base}.protection`, k === 'none' ? { kind: 'none' } : { kind: k, amps: protectionAmps ?? 30 }, {
            shouldDirty: true,
          })
        }
        options={[
          { value: 'fuse', label: 'Fuse' },
          { value: 'breaker', label: 'Breaker' },
          { value: 'none', label: 'None' },
        ]}
      />
      {protectionKind !== 'none' ? (
        <View style={fieldStyles.grid}>
          <Num
            control={control}
            disabled={disabled}
            name={`${base}.protection.amps`}
            label={protectionKind === 'breaker' ? 'Breaker rating' : 'Fuse rating'}
            unit="A"
            range={[1, 1000]}
            testID={`${id}-protection-amps`}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  editor: {
    gap: space.md,
    paddingTop: space.md,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
  sizeWrap: { gap: space.xs },
  stepper: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  stepButton: { paddingHorizontal: space.lg, minWidth: 56 },
  sizeShown: {
    flexDirection: 'row',
    alignItems: 'baseline',
    gap: space.xs,
    minWidth: 88,
    justifyContent: 'center',
    paddingVertical: space.xs,
    borderRadius: radii.md,
    backgroundColor: colors.dune,
  },
});
