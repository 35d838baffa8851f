import { StyleSheet, View, type ViewProps } from 'react-native';
import { colors, radii, shadow, space } from '@/components/theme/tokens';
import { webData } from './web-data';

export function Card({ style, ...rest }: ViewProps) {
  // Marked so the layout checks can find every card and compare its content's width with its own.
  return <View {...webData({ card: 'true' })} {...rest} style={[styles.card, style]} />;
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.card,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.line,
    padding: space.xl,
    gap: space.sm,
    ...shadow.card,
  },
});
