import { useId } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, space } from '@/components/theme/tokens';
import { Text } from './text';
import { webInputStyle, webReadOnlyStyle } from './web-input-style';
import { describeInLocale, fromInputValue, toInputValue, type DateTimeFieldProps } from './date-time-field.types';

/**
 * On the web, the browser's own date or date-and-time input: it shows and takes the value in the user's locale and
 * offers its calendar and clock on phones. The line under it repeats the choice in words.
 */
export function DateTimeField({
  label,
  kind,
  value,
  onChange,
  onBlur,
  error,
  hint,
  editable = true,
  testID,
}: DateTimeFieldProps) {
  const id = useId();
  const inWords = describeInLocale(value, kind);
  const note = error ?? (inWords || hint);
  return (
    <View style={styles.wrap}>
      <Text variant="label" nativeID={`${id}-label`}>
        {label}
      </Text>
      <input
        type={kind === 'date' ? 'date' : 'datetime-local'}
        value={toInputValue(value)}
        disabled={!editable}
        aria-readonly={!editable || undefined}
        aria-label={label}
        aria-labelledby={`${id}-label`}
        aria-describedby={note ? `${id}-note` : undefined}
        aria-invalid={!!error}
        data-testid={testID}
        style={{
          ...webInputStyle,
          borderColor: error ? colors.ember : colors.line,
          ...(editable ? null : webReadOnlyStyle),
        }}
        onChange={(e) => onChange(fromInputValue(e.currentTarget.value))}
        onBlur={onBlur}
      />
      {note ? (
        <Text
          variant="caption"
          color={error ? 'ember' : 'inkSoft'}
          nativeID={`${id}-note`}
          role={error ? 'alert' : undefined}
          testID={`${testID}-note`}
        >
          {note}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.xs } });
