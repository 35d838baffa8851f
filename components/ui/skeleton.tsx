import { StyleSheet, View } from 'react-native';
import { colors, radii } from '@/components/theme/tokens';

export function Skeleton({ height, testID }: { height: number; testID?: string }) {
  return <View testID={testID} accessibilityLabel="Loading" style={[styles.block, { height }]} />;
}

const styles = StyleSheet.create({ block: { backgroundColor: colors.line, borderRadius: radii.lg, opacity: 0.6 } });
