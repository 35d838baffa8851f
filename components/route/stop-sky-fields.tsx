// The stop form's weather choices: where the stop's sky comes from (the record, the forecast or the person's own
// pick), the sky assumed where neither is there, and whether the person's low and high stand over the record.
import { useMemo } from 'react';
import { Controller, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import type { StopSkySource } from '@/shared/schemas/trip';
import { skySourceOptions, type StopFormValues } from './stop-form-values';

const SOURCE_LABEL: Record<StopSkySource, string> = {
  record: 'From the record',
  forecast: 'Forecast',
  preset: 'My pick',
};

const SOURCE_HINT: Record<StopSkySource, string> = {
  record: "Past years' weather at this place and dates; the forecast takes over for the days it reaches.",
  forecast: 'The forecast for the days it reaches (16 ahead); other days use the sky below.',
  preset: 'Your own sky below, for what no record knows, such as wildfire smoke.',
};

const OUTLOOKS = [
  { value: 'clear', label: 'Clear' },
  { value: 'hazy', label: 'Hazy or smoke' },
  { value: 'broken-cloud', label: 'Broken cloud' },
  { value: 'overcast', label: 'Overcast' },
] as const;

export function StopSkyFields({ control }: { control: Control<StopFormValues> }) {
  const [skySource, arrive, depart, timeZone] = useWatch({
    control,
    name: ['skySource', 'arrive', 'depart', 'timeZone'],
  });
  const sources = useMemo(
    () => skySourceOptions({ skySource, arrive, depart, timeZone }, new Date()),
    [skySource, arrive, depart, timeZone],
  );
  return (
    <View style={styles.group}>
      <Controller
        control={control}
        name="skySource"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-sky-source"
            label="Sky"
            value={field.value}
            onChange={field.onChange}
            options={sources.map((value) => ({ value, label: SOURCE_LABEL[value] }))}
          />
        )}
      />
      <Text variant="caption" color="inkSoft" testID="stop-sky-source-hint">
        {SOURCE_HINT[skySource]}
      </Text>
      <Controller
        control={control}
        name="skyOutlook"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-sky"
            label={skySource === 'preset' ? 'Your sky' : 'Sky assumed where there is no record'}
            value={field.value}
            onChange={field.onChange}
            options={[...OUTLOOKS]}
          />
        )}
      />
    </View>
  );
}

export function StopTemperatureSource({ control }: { control: Control<StopFormValues> }) {
  const own = useWatch({ control, name: 'ownTemperatures' });
  return (
    <View style={styles.group}>
      <Controller
        control={control}
        name="ownTemperatures"
        render={({ field }) => (
          <ChoiceChips
            testID="stop-temperature-source"
            label="Temperatures"
            value={field.value ? 'mine' : 'record'}
            onChange={(v) => field.onChange(v === 'mine')}
            options={[
              { value: 'record', label: 'From the record' },
              { value: 'mine', label: 'My low and high' },
            ]}
          />
        )}
      />
      <Text variant="caption" color="inkSoft">
        {own
          ? 'Your low and high stand over recorded and forecast temperatures.'
          : 'Recorded temperatures are used where there are any; your low and high fill in the rest.'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({ group: { gap: space.xs } });
