import { useState } from 'react';
import { Controller, useWatch, type UseFormSetValue } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import type { RigInput } from '@/shared/schemas/rig';
import { Advanced, fieldStyles, Num, type RigControl } from './rig-fields';
import { fuelModelStart, generatorModeFor, type GeneratorModeInput, type GeneratorModeKind } from './rig-form-values';

type Props = { control: RigControl; setValue: UseFormSetValue<RigInput>; disabled: boolean };

/** The generator's rating, fuel, when it runs, and (optionally) how much fuel it burns. */
export function GeneratorFields({ control, setValue, disabled }: Props) {
  const [mode, fuelModel, ratedW, fuel] = useWatch({
    control,
    name: ['generator.mode', 'generator.fuelModel', 'generator.ratedW', 'generator.fuel'],
  });
  // Set hours come from a budget fix; remember the ones the form opened with so picking them again restores them.
  const [opened] = useState<GeneratorModeInput | undefined>(mode?.kind === 'routine' ? mode : undefined);
  const kind: GeneratorModeKind = mode?.kind ?? 'rule';
  const kinds: { value: GeneratorModeKind; label: string }[] = [
    { value: 'rule', label: 'When the charge runs low' },
    ...(opened ? [{ value: 'routine' as const, label: 'On set hours' }] : []),
    { value: 'off', label: 'Off' },
  ];
  return (
    <>
      <View style={fieldStyles.grid}>
        <Num
          control={control}
          disabled={disabled}
          name="generator.ratedW"
          label="Rating"
          unit="W"
          range={[0, 20_000]}
          testID="rig-generator-watts"
        />
      </View>
      <Controller
        control={control}
        name="generator.fuel"
        render={({ field }) => (
          <ChoiceChips
            testID="rig-generator-fuel"
            label="Fuel"
            disabled={disabled}
            value={field.value ?? 'petrol'}
            onChange={field.onChange}
            options={[
              { value: 'petrol', label: 'Petrol' },
              { value: 'diesel', label: 'Diesel' },
              { value: 'propane', label: 'Propane' },
            ]}
          />
        )}
      />
      <ChoiceChips
        testID="rig-generator-mode"
        label="Runs"
        disabled={disabled}
        value={kind}
        onChange={(k) =>
          setValue('generator.mode', generatorModeFor(k, mode, opened), { shouldDirty: true, shouldValidate: true })
        }
        options={kinds}
      />
      {kind === 'rule' ? (
        <>
          <View style={fieldStyles.grid}>
            <Num
              control={control}
              disabled={disabled}
              name="generator.mode.startBelowSocPct"
              label="Start below"
              unit="%"
              range={[0, 100]}
              hint="state of charge that starts it"
              testID="rig-generator-start"
            />
            <Num
              control={control}
              disabled={disabled}
              name="generator.mode.stopAboveSocPct"
              label="Stop above"
              unit="%"
              message="Stop at a higher charge than it starts at (0 to 100 %)."
              hint="state of charge that stops it"
              testID="rig-generator-stop"
            />
          </View>
          <Text variant="caption" color="inkSoft">
            It runs only inside the hours each stop allows a generator.
          </Text>
        </>
      ) : null}
      <Text variant="caption" color="inkSoft" testID="rig-generator-mode-hint">
        {kind === 'routine'
          ? 'Runs on the hours a budget fix set. Those hours are changed from the Budget tab, not here.'
          : kind === 'off'
            ? 'Switched off: the budget counts no generator charging.'
            : 'Set hours are not typed here: apply a generator fix on the Budget tab to run it on set hours.'}
      </Text>
      <Advanced
        what="fuel use"
        testID="rig-generator-advanced"
        control={control}
        fields={['generator.fuelModel.idleFuelKwhPerH', 'generator.fuelModel.fuelKwhPerKwhOut']}
      >
        <Text variant="caption" color="inkSoft">
          Fuel as energy (kWh of fuel, higher heating value). Left out, a typical figure for the fuel and size is used.
        </Text>
        {fuelModel ? (
          <>
            <View style={fieldStyles.grid}>
              <Num
                control={control}
                disabled={disabled}
                name="generator.fuelModel.idleFuelKwhPerH"
                label="Fuel while running"
                unit="kWh/h"
                range={[0, 50]}
                hint="burned each hour it runs, whatever the load"
                testID="rig-generator-idle-fuel"
              />
              <Num
                control={control}
                disabled={disabled}
                name="generator.fuelModel.fuelKwhPerKwhOut"
                label="Fuel per unit out"
                unit="kWh/kWh"
                range={[1, 20]}
                hint="extra fuel for each kWh it delivers"
                testID="rig-generator-fuel-slope"
              />
            </View>
            {disabled ? null : (
              <Button
                testID="rig-generator-fuel-model-off"
                tone="quiet"
                style={styles.start}
                label="Use the typical figure"
                onPress={() => setValue('generator.fuelModel', undefined, { shouldDirty: true })}
              />
            )}
          </>
        ) : disabled ? null : (
          <Button
            testID="rig-generator-fuel-model-on"
            tone="secondary"
            style={styles.start}
            label="Enter my own figures"
            accessibilityLabel="Enter my generator's own fuel figures"
            onPress={() => setValue('generator.fuelModel', fuelModelStart(ratedW, fuel), { shouldDirty: true })}
          />
        )}
      </Advanced>
    </>
  );
}

const styles = StyleSheet.create({ start: { alignSelf: 'flex-start' } });
