import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Text } from './text';

type Tone = 'danger' | 'info';

export function Banner({ message, tone = 'danger', testID }: { message: string; tone?: Tone; testID: string }) {
  return (
    <View
      testID={testID}
      role="alert"
      accessibilityLiveRegion="polite"
      style={[styles.banner, tone === 'danger' ? styles.danger : styles.info]}
    >
      <Text variant="label" color={tone === 'danger' ? 'ember' : 'lake'}>
        {message}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  banner: { borderRadius: radii.md, padding: space.lg, borderWidth: 1 },
  danger: { backgroundColor: colors.emberSoft, borderColor: colors.ember },
  info: { backgroundColor: colors.infoSoft, borderColor: colors.lake },
});
