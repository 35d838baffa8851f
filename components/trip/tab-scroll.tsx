import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, space } from '@/components/theme/tokens';

/** The scrolling body of one trip tab. */
export function TabScroll({ children, testID }: { children: ReactNode; testID: string }) {
  const wide = useIsWide();
  return (
    <ScrollView
      testID={testID}
      style={styles.scroll}
      contentContainerStyle={[styles.content, wide ? styles.contentWide : null]}
    >
      <View style={styles.inner}>{children}</View>
    </ScrollView>
  );
}

/** Two panes side by side on a wide screen, one column on a phone. */
export function Panes({ main, side, sideWidth = 420 }: { main: ReactNode; side: ReactNode; sideWidth?: number }) {
  const wide = useIsWide();
  if (!wide)
    return (
      <View style={styles.column}>
        {main}
        {side}
      </View>
    );
  return (
    <View style={styles.row}>
      <View style={[styles.column, styles.mainPane]}>{main}</View>
      <View style={[styles.column, { width: sideWidth }]}>{side}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  scroll: { flex: 1, backgroundColor: colors.dune },
  content: { padding: space.lg, paddingBottom: space.xxxl },
  contentWide: { paddingHorizontal: space.xxl },
  inner: { width: '100%', maxWidth: 1320, alignSelf: 'center', gap: space.xl },
  row: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  column: { gap: space.xl },
  mainPane: { flex: 1, minWidth: 0 },
});
