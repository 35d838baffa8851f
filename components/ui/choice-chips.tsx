import { Pressable, StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from './text';

type Option<T extends string> = { value: T; label: string };
type Props<T extends string> = {
  label: string;
  options: Option<T>[];
  value: T;
  onChange: (v: T) => void;
  disabled?: boolean;
  testID: string;
};

/** A single choice shown as a row of large chips (a radio group for screen readers). */
export function ChoiceChips<T extends string>({ label, options, value, onChange, disabled, testID }: Props<T>) {
  return (
    <View style={styles.wrap}>
      <Text variant="label">{label}</Text>
      <View style={styles.row} role="radiogroup" aria-label={label} testID={testID}>
        {options.map((o) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value}
              testID={`${testID}-${o.value}`}
              role="radio"
              aria-checked={on}
              accessibilityLabel={`${label}: ${o.label}`}
              disabled={disabled}
              onPress={() => onChange(o.value)}
              style={[styles.chip, on ? styles.on : null, disabled ? styles.disabled : null]}
            >
              <Text variant="label" color={on ? 'white' : 'ink'}>
                {o.label}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
  chip: {
    minHeight: 44,
    paddingHorizontal: space.lg,
    justifyContent: 'center',
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  on: { backgroundColor: colors.pine, borderColor: colors.pine },
  disabled: { opacity: 0.55 },
});
