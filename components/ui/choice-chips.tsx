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
              {on ? <View style={styles.mark} testID={`${testID}-${o.value}-mark`} /> : null}
              <Text variant="label" color={on ? 'pine' : 'ink'} style={styles.chipText}>
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
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.xs,
    justifyContent: 'center',
    borderRadius: radii.pill,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.card,
  },
  // Chosen reads as a ticked, outlined tag in a light tint, never as the solid fill that marks a button (an action).
  on: { backgroundColor: colors.pineSoft, borderColor: colors.pine, borderWidth: 2, paddingHorizontal: space.lg - 1 },
  disabled: { opacity: 0.55 },
  // A long label wraps inside its chip rather than pushing the chip past its card.
  chipText: { flexShrink: 1 },
  // The radio's filled dot: the chosen chip is marked, not filled like a button.
  mark: { width: 10, height: 10, borderRadius: 5, backgroundColor: colors.pine },
});
