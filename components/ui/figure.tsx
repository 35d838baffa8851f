import { StyleSheet, View, type StyleProp, type ViewStyle } from 'react-native';
import type { Figure as FigureValue } from '@/components/format/units';
import { space, type ColorName } from '@/components/theme/tokens';
import { Text } from './text';

type Props = {
  label: string;
  figure: FigureValue;
  note?: string;
  color?: ColorName;
  testID: string;
  /** Overrides the default column width, e.g. narrower figures that sit two to a phone row. */
  style?: StyleProp<ViewStyle>;
};

/** A headline number: big value, small unit, a label above and an optional note below. */
export function Figure({ label, figure, note, color = 'ink', testID, style }: Props) {
  return (
    <View
      style={[styles.wrap, style]}
      testID={testID}
      accessible
      accessibilityLabel={`${label}: ${figure.value} ${figure.unit}${note ? `, ${note}` : ''}`}
    >
      <Text variant="caption" color="inkSoft">
        {label}
      </Text>
      <View style={styles.row}>
        <Text variant="figure" color={color} testID={`${testID}-value`}>
          {figure.value}
        </Text>
        <Text variant="unit" color={color}>
          {figure.unit}
        </Text>
      </View>
      {note ? (
        <Text variant="caption" color="inkSoft">
          {note}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: 2, minWidth: 120, flexGrow: 1, flexBasis: 120 },
  row: { flexDirection: 'row', alignItems: 'baseline', gap: space.xs, flexWrap: 'wrap' },
});
