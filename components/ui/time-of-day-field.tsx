import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { NumberField } from './number-field';
import { snapMinute, type TimeOfDayFieldProps } from './time-of-day-field.types';

/** Native platforms: the hour and the minute as two number fields; the minute is rounded to the step. */
export function TimeOfDayField(props: TimeOfDayFieldProps) {
  const { hour, minute, onChange, stepMinutes = 5, editable = true } = props;
  return (
    <View style={styles.row}>
      <View style={styles.part}>
        <NumberField
          testID={`${props.testID}-hour`}
          label={`${props.label}, hour`}
          editable={editable}
          value={hour}
          onChangeNumber={(h) => h !== null && Number.isInteger(h) && h >= 0 && h <= 23 && onChange(h, minute)}
        />
      </View>
      <View style={styles.part}>
        <NumberField
          testID={`${props.testID}-minute`}
          label="minute"
          editable={editable}
          value={minute}
          onChangeNumber={(m) => m !== null && m >= 0 && m <= 59 && onChange(hour, snapMinute(m, stepMinutes))}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm },
  part: { flex: 1 },
});
