import { Controller, useWatch, type UseFormSetValue } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { FieldSlot } from '@/components/forms/field-slot';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import type { RigInput } from '@/shared/schemas/rig';
import type { UnitSystem } from '@/shared/units';
import { Advanced, fieldStyles, Num, type RigControl } from './rig-fields';
import { panelTemperature, percentOfFraction, perDegree, withMounting } from './rig-form-values';

type Props = {
  control: RigControl;
  setValue: UseFormSetValue<RigInput>;
  index: number;
  units: UnitSystem;
  disabled: boolean;
  onRemove: (() => void) | null;
};

/** One solar array: what most people know (watts, how it is mounted) up front, datasheet figures under Advanced. */
export function SolarArrayFields({ control, setValue, index: i, units, disabled, onRemove }: Props) {
  const array = useWatch({ control, name: `solarArrays.${i}` });
  const tilted = array?.mounting === 'tilted';
  const n = i + 1;
  return (
    <View style={styles.array} testID={`rig-array-${i}`}>
      <View style={fieldStyles.grid}>
        <Controller
          control={control}
          name={`solarArrays.${i}.name`}
          render={({ field, fieldState }) => (
            <FieldSlot fieldRef={field.ref} style={styles.cell}>
              <TextField
                testID={`rig-array-${i}-name`}
                label={`Array ${n} name`}
                editable={!disabled}
                value={field.value ?? ''}
                onChangeText={field.onChange}
                onBlur={field.onBlur}
                error={
                  fieldState.error?.type === 'server'
                    ? fieldState.error.message
                    : fieldState.error
                      ? 'Give the array a name (up to 80 letters).'
                      : undefined
                }
              />
            </FieldSlot>
          )}
        />
        <Num
          control={control}
          disabled={disabled}
          name={`solarArrays.${i}.ratedW`}
          label="Rated power"
          unit="W"
          testID={`rig-array-${i}-watts`}
        />
      </View>
      <Controller
        control={control}
        name={`solarArrays.${i}.portable`}
        render={({ field }) => (
          <ChoiceChips
            testID={`rig-array-${i}-portable`}
            label={`Where array ${n} sits`}
            disabled={disabled}
            value={field.value ? 'portable' : 'roof'}
            onChange={(v) => field.onChange(v === 'portable')}
            options={[
              { value: 'roof', label: 'On the roof' },
              { value: 'portable', label: 'Portable, set out on the ground' },
            ]}
          />
        )}
      />
      {array?.portable ? (
        <Text variant="caption" color="inkSoft">
          A portable array takes no roof room, so it leaves the roof free for more panels.
        </Text>
      ) : null}
      <Controller
        control={control}
        name={`solarArrays.${i}.mounting`}
        render={({ field }) => (
          <ChoiceChips
            testID={`rig-array-${i}-mounting`}
            label={`Array ${n} mounting`}
            disabled={disabled}
            value={field.value ?? 'flat'}
            onChange={(m) => {
              if (array)
                setValue(`solarArrays.${i}`, withMounting(array, m), { shouldDirty: true, shouldValidate: true });
            }}
            options={[
              { value: 'flat', label: array?.portable ? 'Flat on the ground' : 'Flat on the roof' },
              { value: 'tilted', label: 'Tilted' },
            ]}
          />
        )}
      />
      {tilted ? (
        <View style={fieldStyles.grid}>
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.tiltDeg`}
            label="Tilt"
            unit="°"
            range={[0, 90]}
            hint="0° lies flat, 90° stands upright"
            testID={`rig-array-${i}-tilt`}
          />
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.azimuthDeg`}
            label="Facing"
            unit="° from north"
            range={[0, 360]}
            hint="clockwise: 90 east, 180 south, 270 west"
            testID={`rig-array-${i}-azimuth`}
          />
        </View>
      ) : (
        <Text variant="caption" color="inkSoft">
          A flat array faces the sky, so the direction the rig is parked does not change its harvest.
        </Text>
      )}
      <Controller
        control={control}
        name={`solarArrays.${i}.fit`}
        render={({ field }) => (
          <ChoiceChips
            testID={`rig-array-${i}-fit`}
            label="Air behind the panels"
            disabled={disabled}
            value={field.value ?? 'flush'}
            onChange={field.onChange}
            options={[
              { value: 'flush', label: 'Flush (little air, runs hotter)' },
              { value: 'racked', label: 'Racked (air gap)' },
            ]}
          />
        )}
      />
      <Advanced
        what={`array ${n} datasheet and losses`}
        testID={`rig-array-${i}-advanced`}
        control={control}
        fields={[
          `solarArrays.${i}.noctC`,
          `solarArrays.${i}.gammaPctPerC`,
          `solarArrays.${i}.vmpV`,
          `solarArrays.${i}.derate`,
        ]}
      >
        <Text variant="caption" color="inkSoft">
          From the panel&apos;s datasheet. Left alone, these are typical of crystalline panels.
        </Text>
        <View style={fieldStyles.grid}>
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.noctC`}
            label="Operating cell temperature (NOCT)"
            shown={panelTemperature(units)}
            range={[30, 70]}
            hint="how hot the cells run in sun; hotter cells give less"
            testID={`rig-array-${i}-noct`}
          />
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.gammaPctPerC`}
            label="Power temperature coefficient"
            shown={perDegree(units)}
            range={[-1, 0]}
            hint="power lost per degree of cell heat; a negative figure"
            testID={`rig-array-${i}-gamma`}
          />
        </View>
        <View style={fieldStyles.grid}>
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.vmpV`}
            label="Voltage at maximum power (Vmp)"
            unit="V"
            range={[0, 200]}
            hint="matters with a PWM controller, which holds the panel at battery voltage"
            testID={`rig-array-${i}-vmp`}
          />
          <Num
            control={control}
            disabled={disabled}
            name={`solarArrays.${i}.derate`}
            label="Share left after losses"
            shown={percentOfFraction}
            range={[0, 1]}
            hint="wiring, dust, mismatch and ageing; 86 % is usual"
            testID={`rig-array-${i}-derate`}
          />
        </View>
      </Advanced>
      {onRemove ? (
        <Button
          testID={`rig-array-${i}-remove`}
          tone="quiet"
          style={styles.remove}
          label={`Remove array ${n}`}
          onPress={onRemove}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  // A rule under each array, so on a phone one array's fields do not run into the next one's.
  array: { gap: space.md, paddingBottom: space.md, borderBottomWidth: 1, borderBottomColor: colors.line },
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 140 },
  remove: { alignSelf: 'flex-start' },
});
