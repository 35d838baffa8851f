import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';

/** Beside an invite whose e-mail did not go out: it is saved, and Retry next to it sends it. */
export function NotSentNote({ testID }: { testID: string }) {
  return (
    <View style={styles.pill} testID={testID}>
      <Text variant="caption" color="emberInk">
        Not sent — retry
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    alignSelf: 'flex-start',
    backgroundColor: colors.emberSoft,
    borderRadius: radii.pill,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
  },
});
