import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors } from '@/components/theme/tokens';

export function LoadingScreen() {
  return (
    <View style={styles.root} accessibilityLabel="Loading" testID="loading-screen">
      <ActivityIndicator size="large" color={colors.pine} />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, alignItems: 'center', justifyContent: 'center', backgroundColor: colors.dune },
});
