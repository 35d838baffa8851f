import { useRef, type ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
import { colors, space } from '@/components/theme/tokens';

/** Where each keyed tab was scrolled to, so a tab that is drawn again (a budget reloading after an edit) stays put. */
const scrolledTo = new Map<string, number>();

/** The scrolling body of one trip tab. With a scrollKey it keeps its place when it is mounted again. */
export function TabScroll({
  children,
  testID,
  scrollKey,
}: {
  children: ReactNode;
  testID: string;
  scrollKey?: string;
}) {
  const wide = useIsWide();
  const ref = useRef<ScrollView>(null);
  const restored = useRef(false);
  return (
    <ScrollView
      ref={ref}
      testID={testID}
      style={styles.scroll}
      contentContainerStyle={[styles.content, wide ? styles.contentWide : null]}
      scrollEventThrottle={100}
      onScroll={(e) => {
        if (scrollKey) scrolledTo.set(scrollKey, e.nativeEvent.contentOffset.y);
      }}
      onContentSizeChange={(_w, h) => {
        const y = scrollKey ? (scrolledTo.get(scrollKey) ?? 0) : 0;
        // Once the content is tall enough to hold the old place, go back to it (once per mount).
        if (restored.current || y === 0 || h < y) return;
        restored.current = true;
        ref.current?.scrollTo({ y, animated: false });
      }}
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
