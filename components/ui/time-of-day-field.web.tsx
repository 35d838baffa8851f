import { useId, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { space } from '@/components/theme/tokens';
import { Text } from './text';
import { webInputStyle, webReadOnlyStyle } from './web-input-style';
import { formatClock, parseClock, type TimeOfDayFieldProps } from './time-of-day-field.types';

/**
 * On the web, the browser's own time input: it shows the time in the user's locale (12- or 24-hour) and offers its
 * picker on phones. Minutes move in the given step; a typed minute off the step is rounded to it.
 */
export function TimeOfDayField({
  label,
  hour,
  minute,
  onChange,
  stepMinutes = 5,
  editable = true,
  testID,
}: TimeOfDayFieldProps) {
  const id = useId();
  // What the input holds while someone is typing; the committed time comes from the props.
  const [typing, setTyping] = useState<string | null>(null);
  const value = typing ?? formatClock(hour, minute);
  return (
    <View style={styles.wrap}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      <input
        type="time"
        step={stepMinutes * 60}
        value={value}
        disabled={!editable}
        aria-readonly={!editable || undefined}
        aria-labelledby={`${id}-label`}
        data-testid={testID}
        style={editable ? webInputStyle : { ...webInputStyle, ...webReadOnlyStyle }}
        onChange={(e) => {
          const parsed = parseClock(e.currentTarget.value, stepMinutes);
          setTyping(parsed ? null : e.currentTarget.value);
          if (parsed) onChange(parsed[0], parsed[1]);
        }}
        onBlur={() => setTyping(null)}
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.xs } });
